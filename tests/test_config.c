/* test_config.c - the precision CMake configured, the one the headers give this file and the
   one the library was compiled with are the same (a float build must never see double). */
#include "gk_test.h"

#ifndef GK_EXPECT_REAL_IS_FLOAT
#  error "test_config.c is built by CMake, which defines GK_EXPECT_REAL_IS_FLOAT"
#endif

static void header_library_and_cmake_agree(void **state) {
    (void)state;
    assert_int_equal(GK_REAL_IS_FLOAT, GK_EXPECT_REAL_IS_FLOAT);
    assert_int_equal((gk_build_flags() & GK_BUILD_FLOAT) != 0u, GK_EXPECT_REAL_IS_FLOAT);
    assert_int_equal(sizeof(gk_real), GK_EXPECT_REAL_IS_FLOAT ? sizeof(float) : sizeof(double));
}

int main(void) {
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(header_library_and_cmake_agree),
    };
    return cmocka_run_group_tests_name("config", tests, NULL, NULL);
}
