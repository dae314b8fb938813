// Edit → Add Bucket… (Ctrl+B, the toolbar, right-click on a bus): a motor typed in, its
// proposed bucket shown value by value with the clause or table that set each, any value
// changed (checked as the Inspector checks it), the findings the bucket would cause, then
// placed in the bus's next free slot as one edit.
#pragma once

#include "document.h"
#include "lineup/bucket_preview.h"

#include <QDialog>

class QComboBox;
class QFormLayout;
class QLabel;
class QLineEdit;
class QPushButton;
class QTableWidget;
class QTableWidgetItem;

namespace lineward::ui {

class AddBucketDialog : public QDialog {
    Q_OBJECT
public:
    /// `fromTemplate`: a bucket template's row (bucket_template.h) to start from — its motor's
    /// ratings and its choices, sized again for this bus.
    AddBucketDialog(const Document& doc, PartId bus, QWidget* parent = nullptr,
                    const LoadRow* fromTemplate = nullptr, const QString& templateName = {});
    /// The bucket Place adds, with the designer's changes (empty while the motor is not valid).
    const BucketPlan& plan() const { return m_plan; }

private:
    /// The motor changed: size the bucket again (changed values are dropped) and show it.
    void replan();
    /// A value typed into the proposal: checked and applied, or refused with the reason.
    void valueEdited(QTableWidgetItem* item);
    /// Writes the bucket's values and bases into the proposal's rows, in place.
    void fillValues();
    void refreshFindings();
    /// Fills the form from a template's row; its motor's other ratings are kept for replan.
    void startFrom(const LoadRow& row, const QString& name);
    QLineEdit* addField(QFormLayout* form, const char* key, const QString& label,
                        const QString& text);

    const Document& m_doc;
    PartId m_bus;
    BucketPlan m_plan;
    std::vector<BucketField> m_shown;    ///< one per proposal row
    bool m_filling = false;              ///< the dialog itself is writing the table
    QString m_planMessage;               ///< what the sizing said (notes, duty)
    std::optional<Part> m_templateMotor; ///< ratings the form does not show, from a template
    QString m_templateNote;
    std::vector<std::pair<std::string, QLineEdit*>> m_fields;
    QComboBox *m_protection, *m_starter;
    QTableWidget* m_table;
    QTableWidget* m_findings;
    QLabel* m_findingsSummary;
    QLabel* m_message;
    QPushButton* m_place;
};

} // namespace lineward::ui
