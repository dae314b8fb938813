// Typed reference tables (NEC 2023, NEMA ICS 2, IEC 60947-4-1), loaded once at start-up and
// passed explicitly to the rules and sizing functions.
#pragma once

#include "model/ratings.h"
#include "tables/csv_table.h"
#include "tables/embedded.h"

#include <array>
#include <map>
#include <memory>
#include <optional>
#include <span>
#include <string>
#include <vector>

namespace lineward {

/// Short-circuit and ground-fault device types of NEC Table 430.52(C)(1).
enum class ScpdType { NonTimeDelayFuse, TimeDelayFuse, InstantaneousBreaker, InverseTimeBreaker };
/// Motor rows of NEC Table 430.52(C)(1).
enum class MotorType { SinglePhase, SquirrelCage, DesignBPremium, Synchronous, WoundRotor };

std::string_view scpdTypeKey(ScpdType t);
/// Fuses of either kind (their standard ratings include 240.6(A)'s fuse-only ones).
inline bool isFuse(ScpdType t) {
    return t == ScpdType::TimeDelayFuse || t == ScpdType::NonTimeDelayFuse;
}
/// The device type in words, as Table 430.52 names it (for messages; the key is for files).
std::string_view scpdTypeName(ScpdType t);

/// Full-load current table: rows by hp, columns by rated motor voltage.
struct FlcTable {
    std::vector<double> volts;                            ///< column voltages
    std::vector<double> hp;                               ///< row horsepower
    std::vector<std::vector<std::optional<double>>> amps; ///< [row][column]
    std::string source;
};

struct ScpdRow {
    MotorType motor;
    std::array<double, 4> pct;    ///< by ScpdType
    std::array<double, 4> excPct; ///< Exception No. 2 / 430.52(C)(3) maxima; ITB: FLC ≤ 100 A
    double excItbAbove100 = 300;  ///< ITB exception above 100 A FLC
};

struct AmpacityRow {
    std::string size;
    std::array<std::optional<double>, 3> cu, al; ///< 60, 75, 90 °C
};

struct NemaRow {
    std::string size;
    double continuousA = 0;
    std::map<int, double> hp3ph; ///< by voltage column 200, 230, 460, 575
    std::map<int, double> hp1ph; ///< by voltage column 115, 230
};

/// Electrode configurations of IEEE 1584-2018 (3.1 and 4.4): vertical conductors in a box,
/// vertical conductors in a box ending in an insulating barrier, horizontal conductors in a box,
/// vertical and horizontal conductors in open air.
enum class ElectrodeConfig { VCB, VCBB, HCB, VOA, HOA };
std::string_view electrodeConfigKey(ElectrodeConfig c);
std::optional<ElectrodeConfig> electrodeConfigFromKey(std::string_view key);

/// IEEE 1584-2018 coefficient tables (Tables 1, 2, 3-5, 7; Tables 8 and 10 for typical values).
struct ArcFlashTables {
    /// Table 1, by configuration and voltage column (0: 600 V, 1: 2700 V, 2: 14 300 V): k1..k10.
    std::map<ElectrodeConfig, std::array<std::array<double, 10>, 3>> arcingCurrent;
    /// Table 2: k1..k7 of VarCf.
    std::map<ElectrodeConfig, std::array<double, 7>> varCf;
    /// Tables 3, 4, 5, by configuration and voltage column as arcingCurrent: k1..k13.
    std::map<ElectrodeConfig, std::array<std::array<double, 13>, 3>> energy;
    /// Table 7 b1..b3 and Table 6 A, B; [0] typical, [1] shallow. Enclosed configurations only.
    struct EnclosureRow {
        double b1 = 0, b2 = 0, b3 = 0, a = 0, b = 0;
    };
    std::map<ElectrodeConfig, std::array<EnclosureRow, 2>> enclosure;
    /// Tables 8 and 10: typical gap, enclosure and working distance by equipment kind.
    struct TypicalRow {
        std::string kind, voltageClass; ///< "mcc"...; "lv", "5kv", "15kv"
        double gapMm = 0, heightMm = 0, widthMm = 0, depthMm = 0, workingDistanceMm = 0;
        ElectrodeConfig config = ElectrodeConfig::VCB;
    };
    std::vector<TypicalRow> typical;
    /// The typical row of an equipment kind at a system voltage (lv up to 1 kV, 5kv up to
    /// 5 kV, 15kv above); nothing for a kind the tables lack.
    const TypicalRow* typicalFor(std::string_view kind, double systemVolts) const;
};

/// One row of NFPA 70E 2024 Table 130.4(E)(a): shock approach boundaries (ac, phase to phase).
struct ApproachRow {
    double vMin = 0, vMax = 0;                            ///< the row's nominal voltage range, V
    std::string limitedMovable, limitedFixed, restricted; ///< as the table gives them
};

struct TripClassRow {
    std::string name;
    double tpMinS = 0, tpMaxS = 0, trip15xMaxMin = 0;
};

struct ImpedanceRow {
    std::string size;
    double xlPvcAl = 0, xlSteel = 0;
    std::array<std::optional<double>, 3> cuR, alR; ///< pvc, aluminum, steel conduit
};

struct TransformerProtectionRow {
    bool primaryOnly = true, primarySide = true;
    double currentMinA = 0, currentMaxA = 0, pct = 0;
    bool nextSize = false;
};

/// Every reference table. Build with loadTables(); copy-free sharing through shared_ptr.
struct Tables {
    FlcTable flc3, flc1;
    FlcTable flcSync; ///< three-phase synchronous motors, unity power factor
    FlcTable lra3;    ///< Table 430.251(B): Design B, C and D maximum locked-rotor current
    std::vector<ScpdRow> scpd;
    std::vector<std::pair<char, std::array<double, 2>>> codeLetters; ///< letter -> kVA/hp min, max
    std::vector<AmpacityRow> ampacity;
    std::vector<std::pair<double, std::array<std::optional<double>, 3>>>
        ambient;                                       ///< max °C -> 60/75/90
    std::vector<std::pair<double, double>> adjustment; ///< conductors up to -> percent
    std::vector<double> standardRatings; ///< 240.6(A): fuses and inverse-time breakers
    std::vector<double> fuseRatings;     ///< the same with the ratings for fuses only (1, 3, ...)
    std::vector<std::tuple<std::string, Material, double>> smallConductor;
    std::vector<std::tuple<double, std::string, std::string>> egc; ///< device max A, cu, al
    std::vector<std::tuple<std::string, double, double, double>>
        conductors; ///< size, cmil, cu, al ohm/kft
    std::vector<ImpedanceRow> impedance;
    std::vector<TransformerProtectionRow> transformerProtection;
    std::vector<NemaRow> nema;
    std::vector<TripClassRow> tripClasses;
    ArcFlashTables arcFlash;
    std::vector<ApproachRow> approach;          ///< NFPA 70E 2024 Table 130.4(E)(a), by voltage
    std::map<std::string, std::string> sources; ///< table name -> source line

    // --- lookups ---
    /// Table FLC for hp at a rated voltage (column chosen by the code's voltage ranges).
    /// `synchronous`: the three-phase synchronous (unity power factor) columns.
    std::optional<double> flc(double hp, double ratedVolts, int phases, double* columnV = nullptr,
                              bool synchronous = false) const;
    /// Table 430.251(B) maximum locked-rotor current of a polyphase Design B, C or D motor;
    /// `columnV` receives the table column used.
    std::optional<double> maxLockedRotorA(double hp, double ratedVolts,
                                          double* columnV = nullptr) const;
    const ScpdRow& scpdRow(MotorType m) const;
    /// The approach-boundary row for a nominal ac system voltage; a voltage between two rows
    /// (150 V to 151 V) takes the higher row; nothing above the table.
    const ApproachRow* approachFor(double systemVolts) const;
    /// kVA/hp (upper bound of the letter's range); nothing for an unknown letter.
    std::optional<double> codeLetterKvaPerHp(char letter) const;
    std::optional<double> ampacityAt(const std::string& size, Material m, int columnC) const;
    /// Ambient correction factor; nothing where the conductor may not be used at that ambient.
    std::optional<double> ambientFactor(double ambientC, int columnC) const;
    double adjustmentFactor(int currentCarryingConductors) const;
    /// Standard ratings of 240.6(A); `fuse` adds the ratings standard for fuses only.
    std::optional<double> nextStandardAtOrAbove(double amps, bool fuse = false) const;
    std::optional<double> standardAtOrBelow(double amps, bool fuse = false) const;
    bool isStandardRating(double amps, bool fuse = false) const;
    std::optional<double> smallConductorLimit(const std::string& size, Material m) const;
    std::optional<std::string> egcFor(double deviceA, Material m) const;
    std::optional<double> areaCmil(const std::string& size) const;
    const ImpedanceRow* impedanceRow(const std::string& size) const;
    const TripClassRow* tripClass(const std::string& name) const;
    const NemaRow* nemaRow(const std::string& size) const;
    /// Horsepower a NEMA size may start at a voltage (column by the code's ranges).
    std::optional<double> nemaHp(const NemaRow& row, double volts, int phases) const;
};

/// Builds typed tables from table files; throws tables::TableError naming file and line.
std::shared_ptr<const Tables> loadTables(std::span<const tables::EmbeddedFile> files);
/// The tables built into the program.
std::shared_ptr<const Tables> loadBuiltinTables();

} // namespace lineward
