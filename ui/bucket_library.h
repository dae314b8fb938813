// The bucket library: one .lineward fragment per template in a folder under the user's data
// directory (QStandardPaths::AppDataLocation/bucket-templates). Tests run with Qt's test
// locations, so they never touch a real user's library.
#pragma once

#include "io/drawing_file.h"

#include <QString>
#include <QStringList>

namespace lineward::ui {

/// The library's folder (not created until a template is saved).
QString bucketLibraryDir();
/// Template names in the library, sorted (file names without ".lineward").
QStringList bucketTemplateNames();
/// Saves a fragment under `name` (atomic); returns the reason when refused (an empty name, a
/// name with a path separator, or the write failed).
QString saveBucketTemplate(const Drawing& fragment, const QString& name);
/// Reads a template; a damaged file gives its located reason.
io::LoadResult loadBucketTemplate(const QString& name);

} // namespace lineward::ui
