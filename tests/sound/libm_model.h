/*
 * libm_model.h - contracts (ACSL) for the <math.h> functions that gaskit calls and Frama-C's
 * libc model leaves without a specification (Frama-C 25: expm1, cbrt, copysign). Without one,
 * EVA takes any result, NaN included. Each contract states only what C99 Annex F and IEEE 754
 * guarantee for a finite argument (common practice; ISO/IEC 9899:1999 F.9):
 *   expm1(x) = e^x - 1 lies in [-1, 0] for x <= 0 and is finite for x below ln(DBL_MAX) (709.7;
 *     binary32: 88.7);
 *   cbrt(x) is finite with the sign of x, and |cbrt(x)| <= max(1, |x|);
 *   copysign(x, y) is x or -x.
 */
#ifndef GASKIT_LIBM_MODEL_H
#define GASKIT_LIBM_MODEL_H

#include <math.h>

/*@ requires finite_arg: \is_finite(x);
    requires no_overflow: x <= 709.0;
    assigns \result \from x;
    ensures finite: \is_finite(\result);
    ensures above: -1.0 <= \result;
    behavior nonpositive:
      assumes x <= 0.0;
      ensures \result <= 0.0;
    behavior positive:
      assumes x > 0.0;
      ensures \result >= 0.0; */
extern double expm1(double x);

/*@ requires finite_arg: \is_finite(x);
    requires no_overflow: x <= 88.0;
    assigns \result \from x;
    ensures finite: \is_finite(\result);
    ensures above: -1.0 <= \result;
    behavior nonpositive:
      assumes x <= 0.0;
      ensures \result <= 0.0;
    behavior positive:
      assumes x > 0.0;
      ensures \result >= 0.0; */
extern float expm1f(float x);

/*@ requires finite_arg: \is_finite(x);
    assigns \result \from x;
    ensures finite: \is_finite(\result);
    behavior big_neg:
      assumes x < -1.0;
      ensures x <= \result <= -1.0;
    behavior small:
      assumes -1.0 <= x <= 1.0;
      ensures -1.0 <= \result <= 1.0;
    behavior big_pos:
      assumes x > 1.0;
      ensures 1.0 <= \result <= x; */
extern double cbrt(double x);

/*@ requires finite_arg: \is_finite(x);
    assigns \result \from x;
    ensures finite: \is_finite(\result);
    behavior big_neg:
      assumes x < -1.0;
      ensures x <= \result <= -1.0;
    behavior small:
      assumes -1.0 <= x <= 1.0;
      ensures -1.0 <= \result <= 1.0;
    behavior big_pos:
      assumes x > 1.0;
      ensures 1.0 <= \result <= x; */
extern float cbrtf(float x);

/*@ assigns \result \from x, y;
    ensures magnitude: \result == x || \result == -x; */
extern double copysign(double x, double y);

/*@ assigns \result \from x, y;
    ensures magnitude: \result == x || \result == -x; */
extern float copysignf(float x, float y);

#endif /* GASKIT_LIBM_MODEL_H */
