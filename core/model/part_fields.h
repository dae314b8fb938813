// The field tables of each part kind, one function per kind, defined by family in
// part_fields_supply.cpp, part_fields_devices.cpp and part_fields_loads.cpp; part_kind.cpp
// gathers them into the kind table. Private to core/model.
#pragma once

#include "model/part_kind.h"

#include <span>

namespace lineward::part_fields {

std::span<const FieldSpec> sourceFields();
std::span<const FieldSpec> transformerFields();
std::span<const FieldSpec> busFields();

std::span<const FieldSpec> breakerFields();
std::span<const FieldSpec> instBreakerFields();
std::span<const FieldSpec> fuseFields();
std::span<const FieldSpec> disconnectFields();
std::span<const FieldSpec> contactorFields();
std::span<const FieldSpec> overloadFields();
std::span<const FieldSpec> vfdFields();
std::span<const FieldSpec> softStarterFields();

std::span<const FieldSpec> cableFields();
std::span<const FieldSpec> motorFields();
std::span<const FieldSpec> loadFields();

} // namespace lineward::part_fields
