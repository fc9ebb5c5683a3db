/*
 * cubic.h - private real-root solver for monic cubics, shared by every cubic equation of state.
 *
 * Equation:   f(z) = z^3 + c2 z^2 + c1 z + c0 = 0, real coefficients.
 *
 * Result:     gk__cubic_roots() writes the real roots z > lo, ascending, into z[0 .. count-1] and
 *             returns count (0 ... 3). A root of multiplicity two or three is written once: the
 *             count is the number of DISTINCT real roots above lo as decided in working
 *             precision (3 simple roots; 2 when a double root was detected exactly, i.e. f is
 *             zero at a critical point in working precision; 1 otherwise). Unused entries of z[]
 *             are set to 0. Returns -1 (and leaves z[] untouched) when an intermediate is not
 *             finite (coefficients beyond the scaled range, NaN input).
 *
 * Method:     no closed form (Cardano / trigonometric forms lose the small root through
 *             cancellation). Instead, as in Kahan's 1986 notes "To solve a real cubic equation"
 *             and Flocke's ACM TOMS Algorithm 954 (2015), the roots are isolated first and each is
 *             found by Newton's iteration from a start on the side where the iteration converges
 *             monotonically:
 *               1. scaling: when the coefficients would over- or underflow when z^3 is formed, the
 *                  variable is scaled by an exact power of two (z = 2^e y), so no rounding is added;
 *               2. the critical points z1 < z2 (roots of f' = 3z^2 + 2c2 z + c1) are computed with
 *                  the cancellation-free quadratic formula; the signs of f(z1) and f(z2) decide
 *                  whether there are three real roots (f(z1) >= 0 >= f(z2)) or one;
 *               3. the largest root lies where f is convex and increasing (z > z2), the smallest
 *                  where f is concave and increasing (z < z1). From the critical point the
 *                  quadratic Taylor model with the exact cubic remainder gives a start on the
 *                  far side (z2 + sqrt(-f(z2)/sqrt(D)) is above the largest root,
 *                  z1 - sqrt(f(z1)/sqrt(D)) below the smallest; D = c2^2 - 3 c1), from which
 *                  Newton's iterates approach the root monotonically. The optional hint hi (a
 *                  known upper bound of every real root, e.g. 1 + B for a cubic equation of state)
 *                  tightens the start. With D <= 0 (f monotonic) the start is at the inflection
 *                  point s = -c2/3 moved by min(cbrt(|f(s)|), |f(s)|/f'(s)), a bound on the
 *                  distance to the root;
 *               4. the middle root comes from the product of the roots, -c0/(z_small z_large)
 *                  (no cancellation), and is then polished by the same Newton iteration kept
 *                  inside [z1, z2];
 *               5. the iteration stops when the predicted next correction (f'' dx^2 / (2 f')) is
 *                  below one rounding unit, when |f| stops decreasing (rounding level reached), or
 *                  after GK_CUBIC_ITER_MAX steps. There is no recursion and no heap.
 *
 * Error bound: Horner evaluation has a rounding error below 3u sum_i |c_i| |z|^i (u the unit
 *             roundoff, 2^-53 in double, 2^-24 in float) and the iteration stops at the rounding
 *             level, so each returned simple root is the exact root of a cubic whose coefficients
 *             differ from the given ones by a few u relatively (backward stable). The forward
 *             relative error is then at most about 4u times the condition number
 *             kappa = sum_i |c_i| |z|^i / |z f'(z)|, which is O(1) for the well separated roots of
 *             the equations of state. Near a double root the error grows to about sqrt(u kappa),
 *             near a triple root to about cbrt(u) (the limit of any method working on rounded
 *             coefficients). Measured against 50-digit references: see docs/cubic-solver.md.
 */
#ifndef GASKIT_CUBIC_H
#define GASKIT_CUBIC_H

#include "gk_internal.h"

/* Upper bound of Newton steps per root (linear convergence at an exact triple root needs about
   90 steps of factor 2/3 from a distance 1 to reach 2^-53; the starts are much closer). */
#define GK_CUBIC_ITER_MAX 100

/*
 * Real roots z > lo of z^3 + c2 z^2 + c1 z + c0, ascending, in z[0 .. count-1] (see above).
 * hi: a known upper bound of every real root, used only to tighten a start; pass a value
 * <= lo (e.g. 0 with lo = 0... any hi <= lo) when none is known.
 */
int gk__cubic_roots(gk_real c2, gk_real c1, gk_real c0, gk_real lo, gk_real hi, gk_real z[3]);

#endif /* GASKIT_CUBIC_H */
