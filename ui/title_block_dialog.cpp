// TitleBlockDialog: a form over SheetInfo; the revision table takes rows of rev/date/by/note.
#include "title_block_dialog.h"

#include "commands/sheet_info_command.h"

#include <QComboBox>
#include <QDialogButtonBox>
#include <QFormLayout>
#include <QHeaderView>
#include <QLineEdit>
#include <QPushButton>
#include <QTableWidget>
#include <QVBoxLayout>

namespace lineward::ui {

TitleBlockDialog::TitleBlockDialog(const SheetInfo& s, QWidget* parent)
    : QDialog(parent), m_original(s), m_title(new QLineEdit(QString::fromStdString(s.title))),
      m_project(new QLineEdit(QString::fromStdString(s.project))),
      m_number(new QLineEdit(QString::fromStdString(s.drawingNo))),
      m_drawn(new QLineEdit(QString::fromStdString(s.drawnBy))),
      m_checked(new QLineEdit(QString::fromStdString(s.checkedBy))), m_units(new QComboBox),
      m_revisions(new QTableWidget(static_cast<int>(s.revisions.size()), 4)) {
    setWindowTitle(tr("Title block"));
    m_units->addItems({tr("US (hp, AWG/kcmil, ft)"), tr("SI (kW, mm², m)")});
    m_units->setCurrentIndex(s.units == UnitSystem::SI ? 1 : 0);
    m_revisions->setHorizontalHeaderLabels({tr("Rev"), tr("Date"), tr("By"), tr("Note")});
    m_revisions->horizontalHeader()->setStretchLastSection(true);
    for (int r = 0; r < static_cast<int>(s.revisions.size()); ++r) {
        const auto& rev = s.revisions[static_cast<std::size_t>(r)];
        int c = 0;
        for (const auto* v : {&rev.rev, &rev.date, &rev.by, &rev.note})
            m_revisions->setItem(r, c++, new QTableWidgetItem(QString::fromStdString(*v)));
        // The issued drawing's file is not edited here; it stays with its row.
        m_revisions->item(r, 0)->setData(Qt::UserRole, QString::fromStdString(rev.file));
    }
    auto* form = new QFormLayout;
    form->addRow(tr("Title"), m_title);
    form->addRow(tr("Project"), m_project);
    form->addRow(tr("Drawing number"), m_number);
    form->addRow(tr("Drawn by"), m_drawn);
    form->addRow(tr("Checked by"), m_checked);
    form->addRow(tr("Units"), m_units);
    auto* addRev = new QPushButton(tr("Add revision"));
    connect(addRev, &QPushButton::clicked, this,
            [this] { m_revisions->insertRow(m_revisions->rowCount()); });
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel);
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    auto* lay = new QVBoxLayout(this);
    lay->addLayout(form);
    lay->addWidget(m_revisions);
    lay->addWidget(addRev);
    lay->addWidget(buttons);
    resize(640, 480);
}

SheetInfo TitleBlockDialog::result() const {
    SheetInfo s = m_original;
    s.title = m_title->text().toStdString();
    s.project = m_project->text().toStdString();
    s.drawingNo = m_number->text().toStdString();
    s.drawnBy = m_drawn->text().toStdString();
    s.checkedBy = m_checked->text().toStdString();
    s.units = m_units->currentIndex() == 1 ? UnitSystem::SI : UnitSystem::US;
    s.revisions.clear();
    for (int r = 0; r < m_revisions->rowCount(); ++r) {
        auto cell = [&](int c) {
            return m_revisions->item(r, c) ? m_revisions->item(r, c)->text().toStdString()
                                           : std::string();
        };
        const std::string file = m_revisions->item(r, 0)
                                     ? m_revisions->item(r, 0)->data(Qt::UserRole).toString().toStdString()
                                     : std::string();
        if (!cell(0).empty() || !cell(3).empty())
            s.revisions.push_back({cell(0), cell(1), cell(2), cell(3), file});
    }
    return s;
}

void TitleBlockDialog::apply(Document& doc) const {
    SheetInfo s = result();
    if (!(s == doc.drawing().sheet))
        doc.undoStack().push(new SheetInfoCommand(doc, s));
}

} // namespace lineward::ui
