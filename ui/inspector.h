// Inspector: the selected part's tag and ratings, each with its unit, validated as typed. A
// refused value shows why and is not applied.
#pragma once

#include "document.h"

#include <QWidget>

class QFormLayout;
class QLabel;

namespace lineward::ui {

class Inspector : public QWidget {
    Q_OBJECT
public:
    explicit Inspector(Document& doc, QWidget* parent = nullptr);
    /// Shows this part (or nothing).
    void showPart(std::optional<PartId> id);
    /// The last refusal message (empty when the last edit was accepted).
    QString message() const;
    /// Offers `text` for `key` as if typed and committed; returns the refusal, if any.
    QString commit(const std::string& key, const QString& text);

signals:
    /// An accepted edit: the part as it should become.
    void editRequested(lineward::Part after, QString description);

private:
    void rebuild();
    QWidget* editorFor(const FieldSpec& spec, const Part& p);
    QString validate(const std::string& key, const QString& text, Part& trial) const;
    Document& m_doc;
    std::optional<PartId> m_part;
    QFormLayout* m_form;
    QLabel* m_title;
    QLabel* m_message;
};

} // namespace lineward::ui
