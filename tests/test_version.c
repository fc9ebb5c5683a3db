/* test_version.c - version, build flags and status names. */
#include "gk_test.h"
#include <string.h>

static void version_matches_header(void **state) {
    (void)state;
    char expected[32];
    snprintf(expected, sizeof expected, "%d.%d.%d", GK_VERSION_MAJOR, GK_VERSION_MINOR, GK_VERSION_PATCH);
    assert_string_equal(gk_version(), expected);
}

/* This release: 0.2.0 (CHANGELOG.md; the same figure as CMakeLists.txt's project version). */
static void version_is_this_release(void **state) {
    (void)state;
    assert_int_equal(GK_VERSION_MAJOR, 0);
    assert_int_equal(GK_VERSION_MINOR, 2);
    assert_int_equal(GK_VERSION_PATCH, 0);
    assert_string_equal(gk_version(), "0.2.0");
}

static void build_flags_match_config(void **state) {
    (void)state;
    assert_int_equal((gk_build_flags() & GK_BUILD_FLOAT) != 0u, GK_REAL_IS_FLOAT);
    assert_int_equal(sizeof(gk_real), GK_REAL_IS_FLOAT ? sizeof(float) : sizeof(double));
}

static void every_status_has_a_distinct_name(void **state) {
    (void)state;
    for (int i = GK_OK; i <= GK_ERR_PARSE; ++i) {
        const char *s = gk_status_string((gk_status)i);
        assert_non_null(s);
        assert_true(strlen(s) > 0);
        assert_string_not_equal(s, "unknown status");
        for (int j = GK_OK; j < i; ++j) assert_string_not_equal(s, gk_status_string((gk_status)j));
    }
    assert_string_equal(gk_status_string((gk_status)99), "unknown status");
    assert_string_equal(gk_status_string((gk_status)-1), "unknown status");
}

static void constants_are_codata_2018(void **state) {
    (void)state;
    /* CODATA 2018 / SI 2019 exact values; R = N_A k. */
    assert_rel(GK_R, 8.314462618, GK_TOL(1e-15, 1e-7));
    assert_rel(GK_BOLTZMANN, 1.380649e-23, GK_TOL(1e-15, 1e-7));
    assert_rel(GK_AVOGADRO, 6.02214076e23, GK_TOL(1e-15, 1e-7));
    assert_rel(1.380649e-23 * 6.02214076e23, 8.314462618, 1e-10);
    assert_rel(GK_ZERO_CELSIUS_K, 273.15, GK_TOL(1e-15, 1e-7));
    assert_rel(GK_STANDARD_ATMOSPHERE_PA, 101325.0, GK_TOL(1e-15, 1e-7));
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(version_matches_header),
        cmocka_unit_test(version_is_this_release),
        cmocka_unit_test(build_flags_match_config),
        cmocka_unit_test(every_status_has_a_distinct_name),
        cmocka_unit_test(constants_are_codata_2018),
    };
    return cmocka_run_group_tests_name("version", tests, NULL, NULL);
}
