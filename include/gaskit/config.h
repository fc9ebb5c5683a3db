/**
 * @file config.h
 * @brief Build configuration: the precision of gk_real, and whether the reference-grade models
 *        are built.
 *
 * This is the default configuration, for builds without CMake (a vendor IDE, a firmware make
 * file): `cc -std=c99 -Iinclude -c` over the .c files of lib/ builds the double library;
 * `-DGK_REAL_IS_FLOAT=1` on the command line of the library AND of every file that includes a
 * gaskit header builds and uses the float library. A CMake build puts its generated config.h
 * (from config.h.in, with the precision of GASKIT_SINGLE_PRECISION fixed in it) ahead of this
 * file on the include path and installs that one, so installed consumers see the precision the
 * library was built with.
 */
#ifndef GASKIT_CONFIG_H
#define GASKIT_CONFIG_H

#ifndef GK_REAL_IS_FLOAT
/** 1: gk_real is float (single-precision FPUs); 0 (the default): gk_real is double. */
#  define GK_REAL_IS_FLOAT 0
#endif

#if (GK_REAL_IS_FLOAT != 0) && (GK_REAL_IS_FLOAT != 1)
#  error "GK_REAL_IS_FLOAT must be 0 (double) or 1 (float)"
#endif

/* A CMake build defines GK_EXPECT_REAL_IS_FLOAT for the library and its build-tree consumers:
   reaching this file with another precision means the include path is in the wrong order. */
#if defined(GK_EXPECT_REAL_IS_FLOAT) && (GK_EXPECT_REAL_IS_FLOAT != GK_REAL_IS_FLOAT)
#  error "gaskit/config.h: GK_REAL_IS_FLOAT differs from the precision CMake configured"
#endif

#ifndef GK_REFERENCE_MODELS
/** 1 (the default): the reference-grade models (GK_EOS_SPAN_WAGNER, GK_EOS_HYDROGEN) are built;
 *  0 (`-DGK_REFERENCE_MODELS=0` for the library, e.g. a firmware that needs no more than the
 *  cubics, about 6 KiB less on a Cortex-M4F): they return GK_ERR_NOT_FOUND and GK_EOS_BEST is
 *  Peng-Robinson. Only the library's own files read it. */
#  define GK_REFERENCE_MODELS 1
#endif

#endif /* GASKIT_CONFIG_H */
