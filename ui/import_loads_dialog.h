// File → Import Load List…: the buckets a load list would add to a chosen bus, each row's
// proposed bucket and every refused row with its line, column and reason, before anything is
// added.
#pragma once

#include "document.h"
#include "lineup/lineup_builder.h"

#include <QDialog>

class QComboBox;
class QLabel;
class QPushButton;
class QTableWidget;

namespace lineward::ui {

class ImportLoadsDialog : public QDialog {
    Q_OBJECT
public:
    /// `buses` are the MCC and switchboard buses offered; `preferred` is chosen first.
    ImportLoadsDialog(const Document& doc, const QString& fileName, LoadList list,
                      std::vector<PartId> buses, PartId preferred, QWidget* parent = nullptr);
    /// The buckets to add for the chosen bus (what Import adds as one edit).
    const BucketPlan& plan() const { return m_plan; }
    PartId bus() const;

protected:
    void showEvent(QShowEvent* e) override;

private:
    void replan();
    void fillTable();

    const Document& m_doc;
    LoadList m_list;
    std::vector<PartId> m_buses;
    BucketPlan m_plan;
    QComboBox* m_bus;
    QTableWidget* m_table;
    QLabel* m_notes;
    QPushButton* m_import;
};

} // namespace lineward::ui
