// Edit → Add Bucket… (Ctrl+B): a motor typed in, its proposed bucket shown with the clause or
// table that set each value, then placed in the bus's next free slot as one edit.
#pragma once

#include "document.h"
#include "lineup/lineup_builder.h"

#include <QDialog>

class QComboBox;
class QFormLayout;
class QLabel;
class QLineEdit;
class QPushButton;
class QTableWidget;

namespace lineward::ui {

class AddBucketDialog : public QDialog {
    Q_OBJECT
public:
    AddBucketDialog(const Document& doc, PartId bus, QWidget* parent = nullptr);
    /// The bucket Place adds (empty while the motor is not valid).
    const BucketPlan& plan() const { return m_plan; }

private:
    void replan();
    QLineEdit* addField(QFormLayout* form, const char* key, const QString& label,
                        const QString& text);

    const Document& m_doc;
    PartId m_bus;
    BucketPlan m_plan;
    std::vector<std::pair<std::string, QLineEdit*>> m_fields;
    QComboBox *m_protection, *m_starter;
    QTableWidget* m_table;
    QLabel* m_message;
    QPushButton* m_place;
};

} // namespace lineward::ui
