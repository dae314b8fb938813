// Schedules: every device kind in the device schedule, the rating each cell shows (what the
// editor may edit there) and what the check found about each row.
#include "report/schedules.h"
#include "test_support.h"

#include <algorithm>
#include <gtest/gtest.h>

namespace lineward {
namespace {

using test::smallLineup;
using test::testTables;

struct Found {
    const Schedule* schedule = nullptr;
    std::size_t row = 0;
};

Found rowOf(const std::vector<Schedule>& all, const std::string& name, const std::string& tag) {
    for (const auto& s : all)
        if (s.name == name)
            for (std::size_t r = 0; r < s.rows.size(); ++r)
                if (s.rows[r][0] == tag)
                    return {&s, r};
    ADD_FAILURE() << "no row " << tag << " in " << name;
    return {};
}

std::size_t col(const Schedule& s, const std::string& header) {
    const auto it = std::find(s.headers.begin(), s.headers.end(), header);
    EXPECT_NE(it, s.headers.end()) << header;
    return static_cast<std::size_t>(it - s.headers.begin());
}

std::string cell(const Found& f, const std::string& header) {
    return f.schedule ? f.schedule->rows[f.row][col(*f.schedule, header)] : "(no row)";
}

std::optional<ScheduleField> fieldOf(const Found& f, const std::string& header) {
    if (!f.schedule)
        return std::nullopt;
    const auto& row = f.schedule->fields[f.row];
    const std::size_t c = col(*f.schedule, header);
    return c < row.size() ? row[c] : std::nullopt;
}

TEST(Schedules, DeviceScheduleListsEveryDeviceKindWithItsRatingSettingAndType) {
    const Drawing d = smallLineup();
    const auto all = buildSchedules(*runCheck(d, testTables()));
    // The small lineup's values (tests/core/test_support.cpp).
    const Found k = rowOf(all, "devices", "K-1");
    EXPECT_EQ(cell(k, "Kind"), "Contactor");
    EXPECT_EQ(cell(k, "Type"), "NEMA 2");
    EXPECT_EQ(cell(k, "Interrupting kA"), ""); // a contactor interrupts no fault
    const Found ol = rowOf(all, "devices", "OL-1");
    EXPECT_EQ(cell(ol, "Kind"), "Overload relay");
    EXPECT_EQ(cell(ol, "Setting A"), "32");
    const Found cb = rowOf(all, "devices", "CB-1");
    EXPECT_EQ(cell(cb, "Rating A"), "80");
    EXPECT_EQ(cell(cb, "Interrupting kA"), "65");
    EXPECT_EQ(cell(cb, "Type"), "thermal-magnetic trip");
    EXPECT_EQ(cell(rowOf(all, "devices", "CB-M"), "Type"), "electronic trip");
    // Each row has one field list and one findings entry, the same length as the rows.
    for (const auto& s : all) {
        if (s.name == "arcflash")
            continue;
        EXPECT_EQ(s.fields.size(), s.rows.size()) << s.name;
        EXPECT_EQ(s.findings.size(), s.rows.size()) << s.name;
    }
}

TEST(Schedules, ACellNamesTheOneRatingItShowsAndComputedCellsNone) {
    const Drawing d = smallLineup();
    const auto all = buildSchedules(*runCheck(d, testTables()));
    const Found ol = rowOf(all, "devices", "OL-1");
    const auto setting = fieldOf(ol, "Setting A");
    ASSERT_TRUE(setting);
    EXPECT_EQ(setting->part, d.partByTag("OL-1")->id);
    EXPECT_EQ(setting->key, "setting_a");
    EXPECT_FALSE(fieldOf(ol, "Line-side fault kA"));
    EXPECT_FALSE(fieldOf(ol, "Findings"));
    EXPECT_FALSE(fieldOf(ol, "Tag"));
    // A motor's row: the overload cell is the relay's setting, the conductor the cable's size.
    const Found m = rowOf(all, "motors", "M-1");
    EXPECT_EQ(fieldOf(m, "Overload A"), (ScheduleField{d.partByTag("OL-1")->id, "setting_a"}));
    EXPECT_EQ(fieldOf(m, "Conductor"), (ScheduleField{d.partByTag("C-1")->id, "size"}));
    EXPECT_EQ(fieldOf(m, "Rating"), (ScheduleField{d.partByTag("M-1")->id, "hp"}));
    EXPECT_FALSE(fieldOf(m, "FLC A")); // from the NEC table, not a rating
    EXPECT_FALSE(fieldOf(m, "Drop %"));
}

TEST(Schedules, OpenFindingsMarkARowWithTheWorstSeverityAndAcceptedOnesDoNot) {
    Drawing d = smallLineup();
    // NEC 430.32(A)(1): 125 % of the 32 A nameplate is 40 A, so 45 A is too high.
    ASSERT_FALSE(d.part(d.partByTag("OL-1")->id)->set("setting_a", 45.0));
    const auto open = buildSchedules(*runCheck(d, testTables()));
    const Found ol = rowOf(open, "devices", "OL-1");
    ASSERT_NE(ol.schedule, nullptr);
    const RowFindings& f = ol.schedule->findings[ol.row];
    ASSERT_TRUE(f.worst);
    EXPECT_EQ(*f.worst, Severity::Violation);
    EXPECT_GE(f.worstCount, 1);
    EXPECT_EQ(f.accepted, 0);
    EXPECT_EQ(cell(ol, "Findings").rfind("1 violation", 0), 0u) << cell(ol, "Findings");
    // A row without findings is not marked.
    const Found k = rowOf(open, "devices", "K-1");
    EXPECT_FALSE(k.schedule->findings[k.row].worst);

    // Accept every finding about OL-1: the row is no longer marked, and counts them accepted.
    const auto result = runCheck(d, testTables());
    int about = 0;
    for (const auto& x : result->report.findings)
        if (!x.parts.empty() && x.parts.front() == d.partByTag("OL-1")->id) {
            d.accepted().push_back({x.ruleId, x.parts, "R. Vance", "2026-12-03", "by design"});
            ++about;
        }
    ASSERT_GT(about, 0);
    const auto accepted = buildSchedules(*runCheck(d, testTables()));
    const Found ol2 = rowOf(accepted, "devices", "OL-1");
    ASSERT_NE(ol2.schedule, nullptr);
    const RowFindings& g = ol2.schedule->findings[ol2.row];
    EXPECT_FALSE(g.worst);
    EXPECT_EQ(g.open, 0);
    EXPECT_EQ(g.accepted, about);
}

} // namespace
} // namespace lineward
