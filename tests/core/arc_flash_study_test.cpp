// The arc-flash study on a drawing: every bus and bucket, the clearing device and its time at
// the arcing current, the time cap, typical equipment data, and the arcflash.* rules passing
// and failing.
#include "check/check.h"
#include "curves/arc_flash_study.h"
#include "curves/trip_curve.h"
#include "io/drawing_file.h"
#include "model/ratings.h"
#include "report/schedules.h"
#include "test_support.h"
#include "util/trace.h"

#include <algorithm>
#include <cmath>
#include <gtest/gtest.h>

using namespace lineward;
using namespace lineward::test;

namespace {

std::shared_ptr<const CheckResult> checked(const Drawing& d) {
    return runCheck(d, testTables());
}

const ArcFlashEquipment* find(const CheckResult& r, const std::string& tag) {
    for (const auto& e : *r.arcFlash)
        if (e.tag == tag)
            return &e;
    return nullptr;
}

std::vector<const Finding*> findings(const CheckResult& r, const std::string& rule) {
    std::vector<const Finding*> out;
    for (const auto& f : r.report.findings)
        if (f.ruleId == rule)
            out.push_back(&f);
    return out;
}

} // namespace

TEST(ArcFlashStudy, EveryBusAndBucketWithItsClearingDevice) {
    const Drawing d = smallLineup();
    const auto r = checked(d);
    ASSERT_TRUE(r->arcFlash);
    ASSERT_EQ(r->arcFlash->size(), 2u); // the MCC bus and its one bucket
    const auto* bus = find(*r, "MCC");
    const auto* bucket = find(*r, "MCC-1A");
    ASSERT_NE(bus, nullptr);
    ASSERT_NE(bucket, nullptr);
    EXPECT_EQ(bus->kind, "mcc");
    EXPECT_EQ(bucket->kind, "bucket");
    ASSERT_TRUE(bus->result.range.ok()) << bus->result.range.outside.front();

    // The bolted fault is the fault study's at the bus.
    const auto* f = r->study->faultAtNode(r->net->nodeOf(PartId(4), 0));
    ASSERT_NE(f, nullptr);
    EXPECT_DOUBLE_EQ(bus->input.ibfKa, f->ikKa);
    // Typical LV MCC data (IEEE 1584-2018 Tables 8 and 10): 25 mm gap, 457.2 mm (18 in).
    EXPECT_TRUE(bus->usedTypical);
    EXPECT_DOUBLE_EQ(bus->input.gapMm, 25);
    EXPECT_DOUBLE_EQ(bus->input.workingDistanceMm, 457.2);
    EXPECT_EQ(bus->input.config, ElectrodeConfig::VCB);

    // The main clears the arc (the overload relay and the bucket breaker are below the bus);
    // its time is its band's maximum at the arcing current, in both cases.
    ASSERT_NE(bus->clearing, nullptr);
    EXPECT_EQ(bus->clearing->tag, "CB-M");
    const auto curve = TripCurve::of(*d.part(PartId(3)));
    ASSERT_TRUE(curve);
    EXPECT_NEAR(bus->tFullS, curve->maxTime(bus->result.currents.iarc * 1000), 1e-12);
    EXPECT_NEAR(bus->tReducedS, curve->maxTime(bus->result.currents.iarcMin * 1000), 1e-12);
    EXPECT_FALSE(bus->cappedFull);
    // The energy is the model's at those times: nothing is computed twice differently.
    const auto again = arcflash::evaluate(testTables().arcFlash, bus->input, bus->tFullS * 1000,
                                          bus->tReducedS * 1000);
    EXPECT_DOUBLE_EQ(*bus->energyCal(), again.governing().eCalCm2());
    EXPECT_GT(*bus->energyCal(), 0.0);
    // The main is the MCC's own: the note names what clears an arc on its line side.
    bool lineSide = false;
    for (const auto& n : bus->notes)
        lineSide = lineSide || n.find("line side of CB-M") != std::string::npos;
    EXPECT_TRUE(lineSide);

    // The bucket is taken at its line side: the same clearing device, never its own breaker.
    ASSERT_NE(bucket->clearing, nullptr);
    EXPECT_EQ(bucket->clearing->tag, "CB-M");
    EXPECT_DOUBLE_EQ(*bucket->energyCal(), *bus->energyCal());
}

TEST(ArcFlashStudy, TimeCapIsStatedWhereUsed) {
    Drawing d = smallLineup();
    d.settings.arcFlashMaxTimeS = 0.05; // below the main's 0.3 s short-time delay
    const auto r = checked(d);
    const auto* bus = find(*r, "MCC");
    ASSERT_NE(bus, nullptr);
    EXPECT_TRUE(bus->cappedFull);
    EXPECT_DOUBLE_EQ(bus->tFullS, 0.05);
    bool stated = false;
    for (const auto& n : bus->notes)
        stated = stated || n.find("cut to 0.05 s") != std::string::npos;
    EXPECT_TRUE(stated);
    // Energy is proportional to time: the capped result is smaller than the uncapped one.
    const auto uncapped = checked(smallLineup());
    EXPECT_LT(*bus->energyCal(), *find(*uncapped, "MCC")->energyCal());
}

TEST(ArcFlashStudy, EquipmentDataGivenOnTheBusReplaceTheTypicalValues) {
    Drawing d = smallLineup();
    Part* bus = d.part(PartId(4));
    ASSERT_FALSE(bus->set(BusRatings::kAfGapMm, 32.0));
    ASSERT_FALSE(bus->set(BusRatings::kAfWorkingMm, 609.6));
    ASSERT_FALSE(bus->set(BusRatings::kAfConfig, std::string("HCB")));
    const auto r = checked(d);
    const auto* e = find(*r, "MCC");
    ASSERT_NE(e, nullptr);
    EXPECT_DOUBLE_EQ(e->input.gapMm, 32);
    EXPECT_DOUBLE_EQ(e->input.workingDistanceMm, 609.6);
    EXPECT_EQ(e->input.config, ElectrodeConfig::HCB);
    EXPECT_TRUE(e->usedTypical); // the enclosure still is typical
}

TEST(ArcFlashStudy, CautionAboveTheSettingAndNoneBelow) {
    Drawing d = smallLineup();
    d.settings.arcFlashFindings = true;
    const auto base = checked(d);
    const double cal = *find(*base, "MCC")->energyCal();
    // Passing: the setting above the energy gives no arc-flash finding.
    d.settings.arcFlashCautionCal = cal + 1;
    auto r = checked(d);
    EXPECT_TRUE(findings(*r, "arcflash.energy.caution").empty());
    EXPECT_TRUE(findings(*r, "arcflash.energy.limit").empty());
    // Failing: a setting below the energy gives one caution on the bus, with the trace and the
    // safety caution; its bucket, taken at its line side with the same clearing device, has the
    // bus's very result and is named in that finding rather than in one of its own.
    d.settings.arcFlashCautionCal = cal / 2; // a drawing file takes 1.2 and up; code may go lower
    ASSERT_GT(cal, d.settings.arcFlashCautionCal);
    r = checked(d);
    const auto got = findings(*r, "arcflash.energy.caution");
    ASSERT_EQ(got.size(), 1u);
    EXPECT_NE(got[0]->message.find("MCC and its 1 bucket arc-flash incident energy"),
              std::string::npos)
        << got[0]->message;
    bool named = false;
    for (const auto& t : got[0]->trace)
        named = named || (t.name.find("buckets with the same result") == 0 && t.value == "MCC-1A");
    EXPECT_TRUE(named);
    EXPECT_EQ(got[0]->severity, Severity::Caution);
    EXPECT_NEAR(*got[0]->computed, cal, 1e-9);
    EXPECT_DOUBLE_EQ(*got[0]->limit, d.settings.arcFlashCautionCal);
    bool device = false, caution = false;
    for (const auto& t : got[0]->trace) {
        device = device || (t.name == "clearing device" && t.value == "CB-M");
        caution = caution || t.value.find("does not replace") != std::string::npos;
    }
    EXPECT_TRUE(device);
    EXPECT_TRUE(caution);
}

TEST(ArcFlashStudy, ViolationAbove40CalPerSquareCentimetre) {
    // A 1500 kVA transformer and a slow main: an arc on a 480 V switchboard lasts the 2 s cap.
    Drawing d = smallLineup();
    d.settings.arcFlashFindings = true;
    ASSERT_FALSE(d.part(PartId(2))->set("kva", 1500.0));
    Part* main = d.part(PartId(3));
    ASSERT_FALSE(main->set("trip_a", 2000.0));
    ASSERT_FALSE(main->set("st_delay_s", 0.5));
    ASSERT_FALSE(main->set("st_pickup_x", 10.0));
    ASSERT_FALSE(d.part(PartId(4))->set("bus_type", std::string("switchboard")));
    const auto r = checked(d);
    const auto* e = find(*r, "MCC");
    ASSERT_NE(e, nullptr);
    ASSERT_TRUE(e->energyCal());
    ASSERT_GT(*e->energyCal(), 40.0) << "arcing time " << e->tFullS;
    const auto got = findings(*r, "arcflash.energy.limit");
    ASSERT_FALSE(got.empty());
    EXPECT_EQ(got[0]->severity, Severity::Violation);
    EXPECT_DOUBLE_EQ(*got[0]->limit, 40.0);
}

TEST(ArcFlashStudy, OutsideTheModelGivesAReasonAndNoNumber) {
    Drawing d = smallLineup();
    d.settings.arcFlashFindings = true;
    ASSERT_FALSE(d.part(PartId(4))->set(BusRatings::kAfGapMm, 150.0)); // > 76.2 mm at 480 V
    const auto r = checked(d);
    const auto* e = find(*r, "MCC");
    ASSERT_NE(e, nullptr);
    EXPECT_FALSE(e->energyCal());
    const auto got = findings(*r, "arcflash.outside_model");
    ASSERT_FALSE(got.empty());
    EXPECT_NE(got[0]->message.find("6.35 to 76.2 mm"), std::string::npos) << got[0]->message;
    EXPECT_TRUE(findings(*r, "arcflash.energy.caution").empty());
}

TEST(ArcFlashStudy, FindingsOnByDefaultAndOffWhereTheDrawingSaysSo) {
    // The study always runs (the CLI and the window read it); the findings are on by default
    // and a drawing may turn them off (arc_flash_findings: false).
    Drawing d = smallLineup();
    EXPECT_TRUE(d.settings.arcFlashFindings);
    d.settings.arcFlashCautionCal = 0.1;
    auto r = checked(d);
    EXPECT_EQ(findings(*r, "arcflash.energy.caution").size(), 1u); // the bus, with its bucket
    d.settings.arcFlashFindings = false;
    r = checked(d);
    ASSERT_TRUE(r->arcFlash);
    EXPECT_FALSE(r->arcFlash->empty());
    EXPECT_TRUE(findings(*r, "arcflash.energy.caution").empty());
}

TEST(ArcFlashStudy, ABucketWithAResultOfItsOwnGetsItsOwnFinding) {
    // A bucket on a switchboard takes an MCC's typical data (Tables 8 and 10: 25 mm gap,
    // 457.2 mm working distance), not the switchboard's (32 mm, 609.6 mm): its energy differs
    // from its bus's, so it is not folded into the bus's finding.
    Drawing d = smallLineup();
    ASSERT_FALSE(d.part(PartId(4))->set("bus_type", std::string("switchboard")));
    d.settings.arcFlashCautionCal = 0.1;
    const auto r = checked(d);
    const auto* bus = find(*r, "MCC");
    const auto* bucket = find(*r, "MCC-1A");
    ASSERT_TRUE(bus && bucket && bus->energyCal() && bucket->energyCal());
    ASSERT_GT(std::abs(*bus->energyCal() - *bucket->energyCal()), 0.05);
    const auto got = findings(*r, "arcflash.energy.caution");
    ASSERT_EQ(got.size(), 2u);
    EXPECT_EQ(got[0]->message.find("MCC arc-flash"), 0u) << got[0]->message;
    EXPECT_EQ(got[1]->message.find("MCC-1A arc-flash"), 0u) << got[1]->message;
}

TEST(ArcFlashStudy, CurrentSeenAcrossATransformerIsReferredByTheVoltageRatio) {
    // Clean sample: panelboard LP-1 (208 V) is fed by TX-LP1 from CB-LP1 on the 480 V MCC, the
    // first breaker on its line side. CB-LP1 sees the arcing current times 208/480.
    auto loaded = io::loadDrawing(sourcePath("samples/kestrel-mill-mcc1.lineward"));
    ASSERT_TRUE(loaded) << loaded.error->text();
    const auto r = checked(*loaded.drawing);
    const auto* lp = find(*r, "LP-1");
    ASSERT_NE(lp, nullptr);
    ASSERT_TRUE(lp->result.range.ok()) << lp->result.range.outside.front();
    ASSERT_NE(lp->clearing, nullptr);
    EXPECT_EQ(lp->clearing->tag, "CB-LP1");
    EXPECT_EQ(lp->kind, "panelboard");
    EXPECT_NEAR(lp->input.vocKv, 0.208, 1e-9);
    const auto curve = TripCurve::of(*lp->clearing);
    ASSERT_TRUE(curve);
    const double seen = lp->result.currents.iarc * 1000 * 208.0 / 480.0;
    const double t = std::min(curve->maxTime(seen), loaded.drawing->settings.arcFlashMaxTimeS);
    EXPECT_NEAR(lp->tFullS, t, 1e-12);
    // Every bus and every bucket of the sample has a result with its clearing device.
    std::size_t buckets = 0;
    for (const auto& e : *r->arcFlash) {
        EXPECT_NE(e.clearing, nullptr) << e.tag;
        EXPECT_TRUE(e.energyCal()) << e.tag;
        buckets += e.bucket ? 1 : 0;
    }
    EXPECT_EQ(buckets, loaded.drawing->buckets().size());
}

TEST(ArcFlashStudy, ScheduleShowsTheOneResult) {
    // The arc-flash schedule (Schedules panel, CSV, Submittal) reads the check result's study:
    // one row per bus and bucket, the same numbers.
    const auto r = checked(smallLineup());
    const auto schedules = buildSchedules(*r);
    const Schedule* s = nullptr;
    for (const auto& x : schedules)
        if (x.name == "arcflash")
            s = &x;
    ASSERT_NE(s, nullptr);
    ASSERT_EQ(s->rows.size(), r->arcFlash->size());
    const auto energy = std::find(s->headers.begin(), s->headers.end(), "Incident energy cal/cm²");
    ASSERT_NE(energy, s->headers.end());
    const auto col = static_cast<std::size_t>(energy - s->headers.begin());
    for (std::size_t i = 0; i < s->rows.size(); ++i) {
        EXPECT_EQ(s->rows[i][0], (*r->arcFlash)[i].tag);
        EXPECT_EQ(s->rows[i][col], fmt(*(*r->arcFlash)[i].energyCal(), 2));
    }
}
