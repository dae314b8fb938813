// Shared helpers of the ui tests: the tables, sample paths, file bytes.
#pragma once

#include "rules/finding.h"
#include "tables/tables.h"

#include <QString>
#include <memory>
#include <string>

namespace lineward::ui {
class MainWindow;
}

namespace lineward::ui::test {

std::shared_ptr<const Tables> sharedTables();
QString samplePath(const char* name);
std::string fileBytes(const QString& path);
/// The window's drawing as its file bytes.
std::string drawingBytes(MainWindow& w);
/// The first finding of `rule` in the window's check result, or nothing.
const Finding* findingOf(MainWindow& w, const std::string& rule);
/// A fresh temporary folder for one test.
QString tempDir(const char* name);

} // namespace lineward::ui::test
