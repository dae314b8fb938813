// Shared helpers of the ui tests: the tables, sample paths, file bytes.
#pragma once

#include "tables/tables.h"

#include <QString>
#include <memory>
#include <string>

namespace lineward::ui::test {

std::shared_ptr<const Tables> sharedTables();
QString samplePath(const char* name);
std::string fileBytes(const QString& path);
/// A fresh temporary folder for one test.
QString tempDir(const char* name);

} // namespace lineward::ui::test
