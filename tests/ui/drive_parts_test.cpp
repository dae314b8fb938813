// A drive placed from the Parts palette with real mouse events: its Inspector shows the drive's
// own ratings, and a rating typed there lands in the drawing.
#include "inspector.h"
#include "main_window.h"
#include "parts_palette.h"
#include "ui_support.h"
#include "user.h"

#include <QLabel>
#include <QLineEdit>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::ui;
using test::Commit;
using test::sharedTables;
using test::User;

TEST(DriveParts, PlacedFromThePaletteShowsItsRatingsInTheInspector) {
    MainWindow w(sharedTables());
    User user(w);
    auto* palette = w.findChild<PartsPalette*>("partsPalette");
    ASSERT_NE(palette, nullptr);
    EXPECT_EQ(palette->item(static_cast<int>(PartKind::Vfd))->text(),
              QString("Variable-frequency drive"));
    EXPECT_EQ(palette->item(static_cast<int>(PartKind::SoftStarter))->text(),
              QString("Soft starter"));
    const PartId id = user.clickToPlace(PartKind::Vfd, QPointF(0, 0));
    const Part* p = w.document().drawing().part(id);
    ASSERT_NE(p, nullptr);
    ASSERT_EQ(p->kind, PartKind::Vfd);
    user.clickPart(id);
    // The new drive's ratings as part_defaults gives them, shown in its own fields.
    EXPECT_EQ(user.field("input_a")->text(), QString("15.4"));
    EXPECT_EQ(user.field("output_a")->text(), QString("14"));
    EXPECT_EQ(user.field("hp")->text(), QString("10"));
    EXPECT_TRUE(user.field("max_scpd_a")->text().isEmpty());
    QStringList labels;
    for (auto* l : w.inspector()->findChildren<QLabel*>())
        labels << l->text();
    EXPECT_TRUE(labels.join('\n').contains("Rated input current"))
        << labels.join('|').toStdString();
    EXPECT_TRUE(labels.join('\n').contains("Largest listed SCPD"));
    user.type("max_scpd_a", "30", Commit::Enter);
    EXPECT_TRUE(user.inspectorMessage().isEmpty()) << user.inspectorMessage().toStdString();
    EXPECT_EQ(*w.document().drawing().part(id)->number("max_scpd_a"), 30);
    user.type("output_a", "-1", Commit::Enter);
    EXPECT_TRUE(user.inspectorMessage().startsWith("Refused:"));
    EXPECT_EQ(*w.document().drawing().part(id)->number("output_a"), 14);
}
