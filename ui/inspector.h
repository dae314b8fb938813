// Inspector: the selected part's tag and ratings, each with its label and unit, validated as
// typed. A refused value shows why and is not applied.
#pragma once

#include "document.h"

#include <QWidget>

class QCheckBox;
class QComboBox;
class QFormLayout;
class QLabel;
class QLineEdit;

namespace lineward::ui {

/// Edits one part, or several parts of one kind at once (their common fields; a value that
/// differs between them shows blank, and an edit sets it on all as one command). The form is built
/// once per selected part and updated in place after each edit, so an editor is never deleted while
/// its own signal runs (a commit re-checks the drawing and emits partChanged from inside the
/// editor's editingFinished).
class Inspector : public QWidget {
    Q_OBJECT
public:
    explicit Inspector(Document& doc, QWidget* parent = nullptr);
    /// Cuts the editors off first: a focused editor emits editingFinished as it is destroyed.
    ~Inspector() override;
    /// Shows this part (or nothing).
    void showPart(std::optional<PartId> id);
    /// Shows one part, or the common fields of several parts of one kind, or nothing (no parts,
    /// or parts of different kinds, which share no fields).
    void showParts(const std::vector<PartId>& ids);
    QSize sizeHint() const override;
    /// The width at which every label and choice of every kind reads in full.
    int neededWidth() const;

signals:
    /// An accepted edit: the parts as they should become (one command).
    void editRequested(std::vector<lineward::Part> after, QString description);

private:
    /// One row of the form: the editor for a rating, a choice, a flag or an either-or pair.
    struct Row {
        const FieldSpec* spec = nullptr; ///< nothing for the tag row
        const FieldAlternative* pair = nullptr;
        int pairChoice = 0; ///< 0: pair->first, 1: pair->second
        QLineEdit* edit = nullptr;
        QComboBox* combo = nullptr;
        QCheckBox* check = nullptr;
        QComboBox* pairBox = nullptr;
    };

    void buildForm(const Part& p);
    void clearForm();
    void refreshValues();
    /// A bus's arc-flash result from the check result (plain text), or nothing for other parts.
    void refreshArcFlash();
    void refreshRow(Row& row, const std::vector<const Part*>& parts);
    QWidget* makeTextRow(std::size_t index);
    QWidget* makeChoiceRow(std::size_t index);
    QWidget* makeFlagRow(std::size_t index);
    QWidget* makePairRow(std::size_t index);
    void onTextCommitted(std::size_t index);
    void onTextEdited(std::size_t index);
    /// The key a row's text edits (for a pair, the chosen one of the two).
    std::string_view rowKey(const Row& row) const;
    /// The changes that typing `text` into the row asks for, or the reason it is refused.
    QString parseRow(const Row& row, const QString& text,
                     std::vector<std::pair<std::string_view, FieldValue>>& changes) const;
    /// Applies the changes to a copy of the part and asks for the edit; returns the refusal.
    QString commit(const std::vector<std::pair<std::string_view, FieldValue>>& changes,
                   const QString& what);
    QString commitTag(const QString& text);
    /// The first shown part (the one part, or the first of several).
    const Part* current() const;
    /// Every shown part still in the drawing.
    std::vector<const Part*> shown() const;

    Document& m_doc;
    std::vector<PartId> m_parts;
    std::optional<PartKind> m_formKind;
    std::vector<Row> m_rows;
    QFormLayout* m_form;
    QLabel* m_title;
    QLabel* m_message;
    QLabel* m_arcFlash;
};

} // namespace lineward::ui
