/* version.c - version, build flags and status names. */
#include "gk_internal.h"

#define GK_STR2(x) #x
#define GK_STR(x) GK_STR2(x)

const char *gk_version(void) {
    return GK_STR(GK_VERSION_MAJOR) "." GK_STR(GK_VERSION_MINOR) "." GK_STR(GK_VERSION_PATCH);
}

unsigned gk_build_flags(void) {
#if GK_REAL_IS_FLOAT
    return GK_BUILD_FLOAT;
#else
    return 0u;
#endif
}

const char *gk_status_string(gk_status status) {
    switch (status) {
        case GK_OK:
            return "success";
        case GK_ERR_ARGUMENT:
            return "invalid argument (null pointer, enum out of range or unit of the wrong "
                   "dimension)";
        case GK_ERR_DOMAIN:
            return "input not finite or outside the physical domain";
        case GK_ERR_NO_SOLUTION:
            return "no physical solution for these inputs";
        case GK_ERR_RANGE:
            return "outside the model's validity range, or the result overflows";
        case GK_ERR_NOT_FOUND:
            return "no gas or unit with that name";
        case GK_ERR_COMPOSITION:
            return "invalid composition (fractions negative, not summing to 1, or too many)";
        case GK_ERR_PARSE:
            return "malformed text";
        default:
            return "unknown status";
    }
}
