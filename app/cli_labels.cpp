// `lineward-cli labels FILE --out FILE.pdf [--stock NAME] [--date DATE]`: one arc-flash label per
// bus and bucket, from the check's arc-flash study, on label stock as PDF.
#include "check/check.h"
#include "cli_commands.h"
#include "label_sheet.h"
#include "util/safe_text.h"

#include <QDate>
#include <QDir>
#include <QFileInfo>
#include <iostream>
#include <memory>

namespace lineward::cli {

namespace {
struct LabelArgs {
    std::string file, out, stock = "4x6", date;
};
} // namespace

void addLabelsCommand(CLI::App& app, const TablesRef& tables, int& exitCode) {
    auto a = std::make_shared<LabelArgs>();
    auto* cmd = app.add_subcommand(
        "labels", "Write one arc-flash label per bus and bucket (IEEE 1584-2018 study; NFPA 70E "
                  "and NEC 110.16 content) as PDF on label stock. Exit 0, or 2 on a bad file or "
                  "output.");
    cmd->add_option("file", a->file, "drawing (.lineward)")->required()->check(CLI::ExistingFile);
    cmd->add_option("--out", a->out, "the labels PDF")->required();
    cmd->add_option("--stock", a->stock,
                    "4x6 (4 x 6 in labels, one per page; default), letter-2 (two 4 x 6 in "
                    "labels per letter sheet) or letter-4 (four 4 x 5 in labels per letter sheet)")
        ->check(CLI::IsMember({"4x6", "letter-2", "letter-4"}));
    cmd->add_option("--date", a->date,
                    "date of the assessment printed on each label (default "
                    "today, YYYY-MM-DD)");
    cmd->callback([a, &tables, &exitCode] {
        auto loaded = loadForVerb(a->file, exitCode);
        if (!loaded)
            return;
        QString date = QString::fromStdString(a->date);
        if (date.isEmpty())
            date = QDate::currentDate().toString(Qt::ISODate);
        else if (!QDate::fromString(date, Qt::ISODate).isValid()) {
            std::cerr << "lineward-cli labels: --date " << escapeControls(a->date)
                      << " is not a date of the form YYYY-MM-DD\n";
            exitCode = kBadInput;
            return;
        }
        ensureGuiApplication();
        const QString out = QString::fromStdString(a->out);
        QDir().mkpath(QFileInfo(out).absolutePath());
        const auto result = runCheck(std::move(*loaded), *tables);
        const auto r = ui::writeLabelsPdf(
            out, *result, *ui::labelStockByName(QString::fromStdString(a->stock)), date);
        if (!r.error.isEmpty()) {
            std::cerr << "lineward-cli labels: " << escapeControls(r.error.toStdString()) << "\n";
            exitCode = kBadInput;
            return;
        }
        std::cout << "wrote " << a->out << " (" << r.labels << " labels on " << r.pages
                  << " pages)\n";
        exitCode = kClean;
    });
}

} // namespace lineward::cli
