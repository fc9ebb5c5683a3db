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
 *             cancellation). Instead, in the spirit of Kahan's 1986 notes "To solve a real cubic
 *             equation" and Flocke's ACM TOMS Algorithm 954 (2015), each root is found by an
 *             iteration that provably stays in a region holding only that root:
 *               1. scaling: when z^3 could over- or underflow, the variable is scaled by an exact
 *                  power of two (z = 2^e y), so no rounding is added;
 *               2. start for the largest root: the caller's guess, or one Householder step of
 *                  order 4 from the caller's upper bound hi;
 *               3. largest root first, without isolation: when f(s) < 0 at the inflection point
 *                  s = -c2/3, the largest root lies right of s, where f is convex, and right of
 *                  the local minimum z2, where f is also increasing and has no other root. The
 *                  iteration (step 6) runs there and checks every iterate for x > s, f'(x) > 0
 *                  (which puts it right of z2); if one leaves, step 4 takes over. With r2 known:
 *                  lo right of the local maximum z1 (lo >= s, or f'(lo) <= 0) with f(lo) < 0
 *                  leaves only r2 above lo; a negative discriminant of the deflated quadratic,
 *                  in the division-free form r2 (c2 + r2)^2 + 4 c0 < 0 (r2 > 0), means one real
 *                  root. For an equation of state this settles most states with no square
 *                  root and one or two divisions;
 *               4. otherwise (three real roots possible, f(s) >= 0, or the check of step 3
 *                  failed) the roots are isolated: the critical points z1 < z2 (roots of
 *                  f' = 3z^2 + 2c2 z + c1) from the cancellation-free quadratic formula; with
 *                  D = c2^2 - 3c1 <= 0 f is monotonic (one root); else the signs of f(z1) and
 *                  f(z2) decide between three real roots (f(z1) >= 0 >= f(z2)) and one, and
 *                  f(lo) < 0 at a lo right of z1 skips the two smaller ones. The largest root
 *                  (kept from step 3 when it lies above z2) starts above it, at hi or at
 *                  z2 + sqrt(-f(z2)/sqrt(D)) (f(z2 + h) = f(z2) + sqrt(D) h^2 + h^3 exactly);
 *               5. with three roots, the two smaller ones start from the deflated quadratic
 *                  z^2 + (c2 + r) z - c0/r (cancellation-free formula) and are polished on the
 *                  cubic inside z < z1 and z1 < z < z2. A lone root below z1 starts from
 *                  z1 - sqrt(f(z1)/sqrt(D)) (below it); in the monotonic case the start is the
 *                  first step from hi or lo when they bracket the root on the right side, else
 *                  the inflection point moved by min(cbrt|f(s)|, |f(s)|/f'(s));
 *               6. iterations. Step 3 takes Householder's step of order 4,
 *                  x - f (f'^2 - f f''/2) / (f'^3 - f f' f'' + f^2) (f''' = 6; one division),
 *                  or Newton's far from the root. As f is a cubic, its Taylor series at x is
 *                  exact and the root is x - h, h = N + a h^2 - b h^3 (N = f/f', a = f''/(2f'),
 *                  b = 1/f'); the step matches the reversion of this series up to N^3 and leaves
 *                  a (a^2 - 2b) N^4: when that (where |aN|, |b| N^2 <= 1/16) is below one epsilon
 *                  of x, the iteration stops without another evaluation of f. Steps 4 and 5 use
 *                  Halley's iteration x - f f'/(f'^2 - f f''/2), guarded to stay in the isolating
 *                  interval, which stops when the predicted next correction C |dx|^3,
 *                  C = (f''/(2f'))^2 - 1/f', is below one epsilon of x. Both also stop when |f|
 *                  stops decreasing (rounding level reached, the better point is kept) or after
 *                  GK_CUBIC_ITER_MAX steps. No recursion, no heap.
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

/* Upper bound of iteration steps per root (linear convergence at an exact triple root needs about
   90 steps of factor 2/3 from a distance 1 to reach 2^-53; the starts are much closer). */
#define GK_CUBIC_ITER_MAX 100

/*
 * Real roots z > lo of z^3 + c2 z^2 + c1 z + c0, ascending, in z[0 .. count-1] (see above).
 * hi: a known upper bound of every real root, used only for starts; pass a value <= lo when
 * none is known. guess: an estimate of the largest root (above or below it), used (instead of
 * the first step from hi) only when lo < guess < hi; pass any value outside (lo, hi) for none
 * (note that 0 is inside when lo < 0 < hi). Neither changes the result beyond rounding.
 */
int gk__cubic_roots(gk_real c2, gk_real c1, gk_real c0, gk_real lo, gk_real hi, gk_real guess,
                    gk_real z[3]);

#endif /* GASKIT_CUBIC_H */
