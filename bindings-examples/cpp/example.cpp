// example.cpp - gaskit from C++17: the C header as is, and a thin idiomatic layer over it.
//
// gaskit has nothing to free, so the wrapper needs no RAII: it turns a gk_status into an
// exception (or a std::optional), keeps the typed quantity structs, and lets std::array feed
// the batch call. Asserts published values and returns non-zero on any mismatch.
#include <gaskit/gaskit.h>

#include <array>
#include <cmath>
#include <cstdio>
#include <optional>
#include <stdexcept>
#include <string>

namespace gk {

// A failed call as an exception that carries the status and its name.
class error : public std::runtime_error {
public:
    explicit error(gk_status s, const char *what_call)
        : std::runtime_error(std::string(what_call) + ": " + gk_status_string(s)), status(s) {}
    gk_status status;
};

inline void check(gk_status s, const char *what_call) {
    if (s != GK_OK) throw error(s, what_call);
}

// Value-returning forms of two calls; the arguments stay the typed structs of the C API.
inline gk_molar_volume ideal_molar_volume(gk_pressure p, gk_temperature t) {
    gk_molar_volume vm{};
    check(gk_ideal_molar_volume(p, t, &vm), "gk_ideal_molar_volume");
    return vm;
}

inline std::optional<gk_unit> parse_unit(const char *symbol) noexcept {
    gk_unit u{};
    if (gk_unit_parse(symbol, &u) != GK_OK) return std::nullopt;
    return u;
}

// Literal helpers: 101.325_kPa style input in the units a sensor reports.
inline gk_pressure pressure(gk_real value, gk_unit unit) {
    gk_pressure p{};
    check(gk_pressure_from(value, unit, &p), "gk_pressure_from");
    return p;
}
inline gk_temperature temperature(gk_real value, gk_unit unit) {
    gk_temperature t{};
    check(gk_temperature_from(value, unit, &t), "gk_temperature_from");
    return t;
}

}  // namespace gk

static int failures = 0;

static void expect_rel(const char *what, double got, double expected, double rel) {
    const double err = std::fabs(got - expected) / std::fabs(expected);
    const bool ok = err <= rel;
    std::printf("%-56s %.10g (published %.10g, rel. error %.1e) %s\n", what, got, expected, err,
                ok ? "ok" : "FAILED");
    if (!ok) ++failures;
}

int main() {
    // Tolerances: 9 printed digits of the CODATA figure in double; about 7 digits in float.
    const double rel = (gk_build_flags() & GK_BUILD_FLOAT) ? 2e-6 : 1e-9;
    std::printf("gaskit %s from C++17\n", gk_version());

    // CODATA 2018: ideal-gas molar volume at 273.15 K and 101.325 kPa.
    const auto vm = gk::ideal_molar_volume(gk::pressure(GK_REAL_C(101.325), GK_UNIT_KPA),
                                           gk::temperature(GK_REAL_C(0.0), GK_UNIT_DEGC));
    expect_rel("ideal molar volume at 0 degC, 101.325 kPa (m3/mol)", static_cast<double>(vm.m3_per_mol), 22.41396954e-3, rel);

    // A bad reading becomes an exception naming the status.
    try {
        (void)gk::ideal_molar_volume(gk_pressure{GK_REAL_C(101325.0)}, gk_temperature{GK_REAL_C(-1.0)});
        std::printf("negative temperature accepted: FAILED\n");
        ++failures;
    } catch (const gk::error &e) {
        std::printf("negative temperature rejected: %s\n", e.what());
        if (e.status != GK_ERR_DOMAIN) ++failures;
    }

    // std::optional for a lookup that may fail.
    const auto kpa = gk::parse_unit("kPa");
    const auto bogus = gk::parse_unit("furlong");
    std::printf("parse \"kPa\": %s, \"furlong\": %s\n", kpa ? gk_unit_symbol(*kpa) : "none",
                bogus ? gk_unit_symbol(*bogus) : "none");
    if (!kpa || *kpa != GK_UNIT_KPA || bogus) ++failures;

    // The batch call over std::array. ISO 2533 sea level: 1.2250 kg/m3 (R* = 8.31432 there,
    // CODATA R here: about 2e-5 apart; the figure is rounded to 5 digits): tolerance 1e-4.
    std::array<gk_real, 3> p{GK_REAL_C(101325.0), GK_REAL_C(101325.0), GK_REAL_C(-1.0)};
    std::array<gk_real, 3> t{GK_REAL_C(288.15), GK_REAL_C(288.15), GK_REAL_C(288.15)};
    std::array<gk_real, 3> rho{};
    std::array<gk_status, 3> st{};
    const std::size_t ok = gk_ideal_density_batch(p.size(), p.data(), t.data(),
                                                  gk_molar_mass{GK_REAL_C(0.0289644)}, rho.data(), st.data());
    expect_rel("batch: air at ISO 2533 sea level (kg/m3)", static_cast<double>(rho[0]), 1.2250, 1e-4);
    if (ok != 2 || st[2] != GK_ERR_DOMAIN || !std::isnan(rho[2])) {
        std::printf("batch: bad element not reported: FAILED\n");
        ++failures;
    }

    if (failures != 0) {
        std::printf("%d check(s) FAILED\n", failures);
        return 1;
    }
    std::printf("all checks passed\n");
    return 0;
}
