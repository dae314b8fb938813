// New parts' voltages follow what they are dropped onto; pasted parts are renumbered with their
// bucket and land offset.
#include "check/check.h"
#include "io/drawing_file.h"
#include "model/part_defaults.h"
#include "test_support.h"

#include <algorithm>
#include <gtest/gtest.h>

using namespace lineward;

namespace {

int mismatches(const Drawing& d) {
    const auto r = checkDrawing(d, test::testTables());
    return static_cast<int>(std::count_if(r.findings.begin(), r.findings.end(), [](const auto& f) {
        return f.ruleId == "topology.voltage.mismatch";
    }));
}

// Places a starter part for `d` dropped onto `onto` and wires its first terminal there.
PartId dropAndWire(Drawing& d, PartKind kind, std::optional<WireEnd> onto) {
    Part p = makeStarterPart(d, kind, onto);
    const PartId id = p.id;
    d.addPart(std::move(p));
    if (onto)
        d.addWire(Wire{d.nextWireId(), *onto, {id, 0}});
    return id;
}

} // namespace

struct MotorColumn {
    double systemV, motorV;
};
class MotorVolts : public ::testing::TestWithParam<MotorColumn> {};

// NEC 2023 Table 430.250 column headings, from memory.
TEST_P(MotorVolts, NameplateVoltageForTheSystem) {
    EXPECT_EQ(motorVoltsFor(GetParam().systemV), GetParam().motorV);
}
INSTANTIATE_TEST_SUITE_P(Nec430_250, MotorVolts,
                         ::testing::Values(MotorColumn{120, 115}, MotorColumn{208, 200},
                                           MotorColumn{240, 230}, MotorColumn{480, 460},
                                           MotorColumn{600, 575}, MotorColumn{4160, 4160}));

TEST(StarterVoltage, MotorDroppedBelowAnOverloadOnA480VBusIsRated460V) {
    Drawing d = test::smallLineup(); // overload relay is part 7, on the 480 V MCC
    ASSERT_EQ(terminalVolts(d, {PartId(7), 1}), 480.0); // through OL, K and CB to the bus
    const Part m = makeStarterPart(d, PartKind::Motor, WireEnd{PartId(7), 1});
    EXPECT_EQ(m.number("volts"), 460.0);
    EXPECT_EQ(m.tag, "M-2");
    EXPECT_EQ(m.id, d.nextPartId());
    // Never walks through a transformer: its primary side is 13.8 kV.
    EXPECT_EQ(terminalVolts(d, {PartId(2), 0}), 13800.0);
    EXPECT_EQ(terminalVolts(d, {PartId(2), 1}), 480.0);
}

TEST(StarterVoltage, A208VSystemGives200VMotorsAndTheirCurrent) {
    Drawing d;
    Part panel = makeStarterPart(PartKind::Bus, PartId(1), "PNL");
    ASSERT_FALSE(panel.set("volts", 208.0));
    d.addPart(panel);
    const PartId bus = panel.id;
    const Part onBus = makeStarterPart(d, PartKind::Motor, WireEnd{bus, 0});
    EXPECT_EQ(onBus.number("volts"), 200.0);
    EXPECT_NEAR(*onBus.number("fla"), 32.2, 0.1); // 14 A at 460 V scaled to 200 V
    // Not dropped onto anything: the drawing's system voltage (its buses) still applies.
    const Part loose = makeStarterPart(d, PartKind::Motor, std::nullopt);
    EXPECT_EQ(loose.number("volts"), 200.0);
    EXPECT_EQ(makeStarterPart(d, PartKind::Load, std::nullopt).number("volts"), 208.0);
    EXPECT_EQ(systemVolts(Drawing{}), 480.0);
}

TEST(StarterVoltage, NewSourceTransformerBusMotorChainHasNoMismatch) {
    Drawing d;
    const PartId src = dropAndWire(d, PartKind::Source, std::nullopt);
    const PartId tx = dropAndWire(d, PartKind::Transformer, WireEnd{src, 0});
    const PartId bus = dropAndWire(d, PartKind::Bus, WireEnd{tx, 1});
    const PartId cb = dropAndWire(d, PartKind::Breaker, WireEnd{bus, 0});
    dropAndWire(d, PartKind::Motor, WireEnd{cb, 1});
    EXPECT_EQ(d.part(src)->number("kv"), 13.8);
    EXPECT_EQ(d.part(tx)->number("pri_v"), 13800.0);
    EXPECT_EQ(d.part(tx)->number("sec_v"), 480.0);
    EXPECT_EQ(d.part(bus)->number("volts"), 480.0);
    EXPECT_EQ(mismatches(d), 0);

    // The check can see a mismatch: the kind-only starter source is 0.48 kV.
    Drawing old = d;
    Part lv = makeStarterPart(PartKind::Source, src, "UTIL-1");
    old.removePart(src);
    old.addPart(lv);
    old.addWire(Wire{old.nextWireId(), {src, 0}, {tx, 0}});
    EXPECT_GE(mismatches(old), 1);
}

TEST(StarterVoltage, TransformerBelowA480VBusStepsDownTo208V) {
    Drawing d = test::smallLineup();
    const Part tx = makeStarterPart(d, PartKind::Transformer, WireEnd{PartId(4), 0});
    EXPECT_EQ(tx.number("pri_v"), 480.0);
    EXPECT_EQ(tx.number("sec_v"), 208.0);
}

namespace {

// A 480 V bus and bucket B-101 (CB-101, K-101, OL-101, C-101, M-101) in a chain; M-105
// elsewhere makes 105 the highest motor number.
// Adds a starter part with the next id.
PartId addStarter(Drawing& d, PartKind kind, const char* tag, double x = 0, double y = 0) {
    Part p = makeStarterPart(kind, d.nextPartId(), tag);
    p.x = x;
    p.y = y;
    d.addPart(p);
    return p.id;
}

Drawing bucketDrawing(std::vector<PartId>& bucketParts) {
    Drawing d;
    addStarter(d, PartKind::Bus, "MCC-1");
    const PartKind kinds[] = {PartKind::Breaker, PartKind::Contactor, PartKind::Overload,
                              PartKind::Cable, PartKind::Motor};
    const char* tags[] = {"CB-101", "K-101", "OL-101", "C-101", "M-101"};
    for (int i = 0; i < 5; ++i) {
        bucketParts.push_back(addStarter(d, kinds[i], tags[i], 0, 70.0 * (i + 1)));
        if (i > 0)
            d.addWire(Wire{d.nextWireId(), {bucketParts[i - 1], 1}, {bucketParts[i], 0}});
    }
    d.addBucket(Bucket{d.nextBucketId(), "B-101", 65.0, bucketParts});
    addStarter(d, PartKind::Motor, "M-105", 400, 0);
    return d;
}

// The clipboard: the bucket's parts, wires and the bucket itself.
Drawing clipOf(const Drawing& d, const std::vector<PartId>& ids) {
    Drawing clip;
    for (auto id : ids)
        clip.addPart(*d.part(id));
    for (const auto& w : d.wires())
        if (std::count(ids.begin(), ids.end(), w.a.part) &&
            std::count(ids.begin(), ids.end(), w.b.part))
            clip.addWire(w);
    clip.addBucket(d.buckets().front());
    return clip;
}

void addAll(Drawing& d, const PasteSet& s) {
    for (const auto& p : s.parts)
        d.addPart(p);
    for (const auto& w : s.wires)
        d.addWire(w);
    for (const auto& b : s.buckets)
        d.addBucket(b);
}

} // namespace

TEST(Paste, BucketGetsOneNewNumberForEveryPrefix) {
    std::vector<PartId> ids;
    Drawing d = bucketDrawing(ids);
    const Drawing clip = clipOf(d, ids);
    const PasteSet s = preparePaste(d, clip);
    ASSERT_EQ(s.parts.size(), 5u);
    std::vector<std::string> tags;
    for (const auto& p : s.parts)
        tags.push_back(p.tag);
    EXPECT_EQ(tags, (std::vector<std::string>{"CB-106", "K-106", "OL-106", "C-106", "M-106"}));
    ASSERT_EQ(s.buckets.size(), 1u);
    EXPECT_EQ(s.buckets[0].tag, "B-106");
    EXPECT_EQ(s.buckets[0].id, d.nextBucketId());
    for (std::size_t i = 0; i < 5; ++i) {
        EXPECT_EQ(s.parts[i].id.value, d.nextPartId().value + i);
        EXPECT_EQ(s.parts[i].x, d.part(ids[i])->x + 40);
        EXPECT_EQ(s.buckets[0].parts[i], s.parts[i].id);
    }
    // The wires join the copies, not the originals.
    ASSERT_EQ(s.wires.size(), 4u);
    EXPECT_EQ(s.wires[0].a.part, s.parts[0].id);
    EXPECT_EQ(s.wires[0].b.part, s.parts[1].id);

    // Pasting again lands 40 further and takes the next number.
    addAll(d, s);
    const PasteSet again = preparePaste(d, clip);
    EXPECT_EQ(again.parts[0].tag, "CB-107");
    EXPECT_EQ(again.buckets[0].tag, "B-107");
    EXPECT_EQ(again.parts[0].x, d.part(ids[0])->x + 80);
    EXPECT_EQ(again.parts[0].y, d.part(ids[0])->y + 80);
}

TEST(Paste, LoosePartsTakeTheNextTagAndFreeTagsStay) {
    std::vector<PartId> ids;
    const Drawing d = bucketDrawing(ids);
    Drawing clip;
    clip.addPart(*d.part(ids[4])); // M-101 alone, no bucket
    const PasteSet s = preparePaste(d, clip);
    ASSERT_EQ(s.parts.size(), 1u);
    EXPECT_EQ(s.parts[0].tag, "M-106");
    EXPECT_TRUE(s.buckets.empty());

    // Into an empty drawing nothing clashes: tags are kept.
    const PasteSet fresh = preparePaste(Drawing{}, clipOf(d, ids));
    EXPECT_EQ(fresh.parts[0].tag, "CB-101");
    EXPECT_EQ(fresh.buckets[0].tag, "B-101");
}

TEST(Paste, BucketWithoutANumberKeepsItsPartsApart) {
    Drawing d;
    const PartId k = addStarter(d, PartKind::Contactor, "K-7");
    const PartId m = addStarter(d, PartKind::Motor, "FAN");
    d.addBucket(Bucket{BucketId(1), "FAN STARTER", 65.0, {k, m}});
    const PasteSet s = preparePaste(d, d);
    EXPECT_EQ(s.parts[0].tag, "K-8");
    EXPECT_EQ(s.parts[1].tag, "M-1");
    EXPECT_EQ(s.buckets[0].tag, "FAN STARTER-copy");
}

TEST(Paste, SampleUnitWithItsCableAndMotorTakesOneNumber) {
    auto loaded = io::loadDrawing(test::sourcePath("samples/kestrel-mill-mcc1.lineward"));
    ASSERT_TRUE(loaded.drawing);
    const Drawing& d = *loaded.drawing;
    const Bucket* unit = nullptr;
    for (const auto& b : d.buckets())
        if (b.tag == "MCC1-1A")
            unit = &b;
    ASSERT_NE(unit, nullptr);
    std::vector<PartId> ids = unit->parts; // CB-101, K-101, OL-101
    ids.push_back(d.partByTag("C-101")->id);
    ids.push_back(d.partByTag("P-101")->id);
    std::sort(ids.begin(), ids.end());
    Drawing clip;
    for (auto id : ids)
        clip.addPart(*d.part(id));
    clip.addBucket(*unit);
    const PasteSet s = preparePaste(d, clip);
    std::vector<std::string> tags;
    for (const auto& p : s.parts)
        tags.push_back(p.tag);
    // 112 is the highest number of CB-, K-, OL-, C- and P- in the sample.
    EXPECT_EQ(tags, (std::vector<std::string>{"CB-113", "K-113", "OL-113", "C-113", "P-113"}));
    EXPECT_EQ(s.buckets[0].tag, "MCC1-14A"); // the sample's units run to MCC1-13A
}
