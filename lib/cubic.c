/*
 * cubic.c - real roots of a monic cubic: the largest root first by an order-4 iteration on the
 * convex side, then (only where more roots may lie above lo) isolation at the critical points and
 * Halley's iteration from guarded starts. Method and error bound: see cubic.h and
 * docs/cubic-solver.md.
 */
#include "cubic.h"

#include <stdbool.h>

#if GK_REAL_IS_FLOAT
/* Scale when |z| could pass 2^16: then z^3 stays inside 2^+-48, far from FLT_MAX (2^128) and
   from the subnormals (2^-126) (common practice: keep a margin for products of two terms). */
#  define CUBIC_SCALE_EXP 16
#  define CUBIC_BIG GK_LIT(65536.0) /* 2^16 */
#else
/* Scale when |z| could pass 2^64 (z^3 inside 2^+-192, far from 2^+-1022). */
#  define CUBIC_SCALE_EXP 64
#  define CUBIC_BIG GK_LIT(18446744073709551616.0) /* 2^64 */
#endif

/* Half the unit roundoff is too strict for the stopping test; one epsilon is the rounding level. */
#define CUBIC_EPS GK_REAL_EPS

/* 1/3 rounded (one rounding more than a division; z1, z2 only isolate the roots). */
#define CUBIC_THIRD (GK_LIT(1.0) / GK_LIT(3.0))

typedef struct cubic_poly {
    gk_real c2, c1, c0;
} cubic_poly;

/* The caller's bounds and what the first steps learnt (after the scaling of step 1). */
typedef struct cubic_ctx {
    gk_real lo;     /* roots at or below lo are not wanted */
    gk_real hi;     /* the caller's upper bound of every root, when have_hi */
    gk_real hstep;  /* the start for the largest root from hi (step 2) */
    gk_real rknown; /* the largest root from cubic_descend(), when have_known */
    bool have_hi;
    bool have_known;
} cubic_ctx;

/* Outcome of an iteration. */
typedef enum cubic_iter {
    CUBIC_CONVERGED, /* stopped by one of its tests at a finite point */
    CUBIC_LEFT,      /* cubic_descend() only: an iterate left the convex increasing side */
    CUBIC_FAILED     /* GK_CUBIC_ITER_MAX steps without stopping, or a value not finite */
} cubic_iter;

/* f(z) by Horner's rule: rounding error below 3u sum |c_i||z|^i (Higham, Accuracy and Stability
   of Numerical Algorithms, 2nd ed., section 5.1). */
static gk_real cubic_f(const cubic_poly *p, gk_real z) {
    return ((((z + p->c2) * z) + p->c1) * z) + p->c0;
}

/* f'(z) = 3 z^2 + 2 c2 z + c1. */
static gk_real cubic_df(const cubic_poly *p, gk_real z) {
    return (((GK_LIT(3.0) * z) + (GK_LIT(2.0) * p->c2)) * z) + p->c1;
}

static bool cubic_nonzero(gk_real x) { return (x < GK_LIT(0.0)) || (x > GK_LIT(0.0)); }

/* x is finite (NaN and both infinities fail), written as two comparisons in the caller's
   condition so that an analyser sees the bound on the branch that uses x. */
#define CUBIC_ISFINITE(x) (((x) >= -GK_REAL_MAX) && ((x) <= GK_REAL_MAX))

/*
 * Halley's iteration (cubically convergent: x - f f' / (f'^2 - f f''/2)) from x0 inside (lo, hi),
 * an interval on which f is monotonic and holds the root. Iterates leaving the interval are
 * pulled back halfway towards its end. Stops when the predicted remaining error C |dx|^3,
 * C = (f''/(2 f'))^2 - f'''/(6 f'), is below one epsilon of x; when |f| stops decreasing
 * (rounding level: the previous point is kept); when f or the Halley denominator is exactly 0,
 * or the guarded point is not inside the interval. Near a multiple root (f' -> 0) the prediction
 * is large and the |f| test ends the iteration. CUBIC_FAILED after GK_CUBIC_ITER_MAX steps
 * without stopping, or when f is not finite at an accepted point.
 */
static cubic_iter cubic_halley(const cubic_poly *p, gk_real x0, gk_real lo, gk_real hi,
                               gk_real *root) {
    gk_real x = x0;
    gk_real fx = cubic_f(p, x);
    gk_real xn = x0;
    gk_real d1, d2, den, dx, fn;
    int i;
    bool done = false;
    bool finite = CUBIC_ISFINITE(fx);
    for (i = 0; (i < GK_CUBIC_ITER_MAX) && !done && finite; ++i) {
        d1 = cubic_df(p, x);
        d2 = (GK_LIT(6.0) * x) + (GK_LIT(2.0) * p->c2);
        den = (d1 * d1) - (GK_LIT(0.5) * fx * d2);
        if (!cubic_nonzero(fx) || !cubic_nonzero(den)) {
            done = true;
        } else {
            dx = fx * d1 / den;
            xn = x - dx;
            if (!((xn > lo) && (xn < hi))) {
                /* guarded: stay inside the isolating interval */
                xn = (xn <= lo) ? (GK_LIT(0.5) * (x + lo)) : (GK_LIT(0.5) * (x + hi));
                done = !((xn > lo) && (xn < hi));
            } else if ((gk_fabs(dx) * dx * dx * ((d2 * d2) + (GK_LIT(4.0) * gk_fabs(d1)))) <=
                       (GK_LIT(4.0) * CUBIC_EPS * d1 * d1 * gk_fabs(xn))) {
                x = xn; /* the next correction would be below one rounding unit */
                done = true;
            } else {
                /* the step is taken below */
            }
        }
        if (!done) {
            fn = cubic_f(p, xn);
            if ((i > 0) && !(gk_fabs(fn) < gk_fabs(fx))) {
                done = true; /* rounding level reached at x */
            } else {
                x = xn;
                fx = fn;
                finite = CUBIC_ISFINITE(fn);
            }
        }
    }
    *root = x;
    return (done && finite && CUBIC_ISFINITE(x)) ? CUBIC_CONVERGED : CUBIC_FAILED;
}

/* One step of cubic_descend() from x (f(x) = fx != 0): *xn, and whether the error left after it
   is below one rounding unit (see there). Returns false when x or the step leaves the convex
   increasing side (f'(x) <= 0, or xn <= s). */
static bool cubic_descend_step(const cubic_poly *p, gk_real x, gk_real fx, gk_real s, gk_real *xn,
                               bool *last) {
    const gk_real d1 = cubic_df(p, x);
    gk_real d1s, d2h, fd, num, den, dx, dx2;
    bool inside = d1 > GK_LIT(0.0);
    if (inside) {
        d2h = (GK_LIT(3.0) * x) + p->c2; /* f''/2 */
        fd = fx * d2h;
        d1s = d1 * d1;
        num = fx * (d1s - fd);
        den = (d1 * (d1s - (GK_LIT(2.0) * fd))) + (fx * fx);
        dx = (den > GK_LIT(0.0)) ? (num / den) : (fx / d1);
        *xn = x - dx;
        inside = *xn > s;
        dx2 = dx * dx;
        *last = inside && (den > GK_LIT(0.0)) && ((GK_LIT(16.0) * gk_fabs(fd)) <= d1s) &&
                ((GK_LIT(16.0) * fx * fx) <= (d1s * d1)) &&
                ((GK_LIT(2.0) * gk_fabs(d2h * ((d2h * d2h) - (GK_LIT(2.0) * d1))) * (dx2 * dx2)) <=
                 (CUBIC_EPS * gk_fabs(*xn) * (d1s * d1)));
    }
    return inside;
}

/*
 * The largest root from a start x0 above the inflection point s = -c2/3, where f is convex. Every
 * iterate is checked to stay on the convex and increasing side (x > s and f'(x) > 0). There, right
 * of the local minimum z2, f has at most one root (the largest), so every accepted iterate is on
 * the way to it. Returns CUBIC_LEFT (and nothing in *root) when an iterate leaves that side: then
 * the largest root is below s or f has a multiple root near z2, and the caller isolates the roots.
 *
 * The step is Householder's of order 4, x - f (f'^2 - f f''/2) / (f'^3 - f f' f'' + f^2 f'''/6)
 * with f''' = 6: numerator and denominator are formed side by side and divided once, so a step
 * costs one division on its critical path. A Newton step is taken where the denominator is not
 * positive (far above the root; from above on a convex f Newton never passes the root).
 * Stopping: f is a cubic, so its Taylor expansion at x is exact and the root is x - h with
 *     h = N + a h^2 - b h^3,   N = f/f',  a = f''/(2 f'),  b = f'''/(6 f') = 1/f',
 * whose reversion h = N (1 + aN + (2a^2 - b) N^2 + 5a (a^2 - b) N^3 + ...) the step reproduces
 * up to N^3: the error it leaves is a (a^2 - 2b) N^4 to leading order. Near the root
 * (|aN| <= 1/16 and b N^2 <= 1/16, where the series converges fast) the iteration stops when that
 * prediction is below one epsilon of x, without evaluating f again. The test needs no division:
 * with the step dx for N (there |dx/N - 1| < 1/15, so N^4 < 1.3 dx^4, covered by a factor 2) it
 * reads 2 |f''/2 (f''^2/4 - 2 f')| dx^4 <= eps |x| f'^3. The iteration also stops when |f| stops
 * decreasing (rounding level reached, the previous point is kept) or f is exactly 0.
 * CUBIC_FAILED after GK_CUBIC_ITER_MAX steps without stopping, or when f is not finite at an
 * accepted point.
 */
static cubic_iter cubic_descend(const cubic_poly *p, gk_real x0, gk_real s, gk_real *root) {
    gk_real x = x0;
    gk_real fx = cubic_f(p, x);
    gk_real xn = x0;
    gk_real fn;
    int i;
    bool done = false;
    bool left = false;
    bool last = false;
    bool finite = CUBIC_ISFINITE(fx);
    for (i = 0; (i < GK_CUBIC_ITER_MAX) && !done && finite; ++i) {
        if (!cubic_nonzero(fx)) {
            done = true;
        } else if (!cubic_descend_step(p, x, fx, s, &xn, &last)) {
            left = true;
            done = true;
        } else if (last) {
            x = xn; /* the error left is below one rounding unit */
            done = true;
        } else {
            fn = cubic_f(p, xn);
            if ((i > 0) && !(gk_fabs(fn) < gk_fabs(fx))) {
                done = true; /* rounding level reached at x */
            } else {
                x = xn;
                fx = fn;
                finite = CUBIC_ISFINITE(fn);
            }
        }
    }
    if (left) { return CUBIC_LEFT; }
    if (!done || !finite || !CUBIC_ISFINITE(x)) { return CUBIC_FAILED; }
    *root = x;
    return CUBIC_CONVERGED;
}

/* Binary exponent k of a non-zero finite x (x = m 2^k, 0.5 <= |m| < 1); frexp() gives at most
   +-1100 in magnitude for binary64 and binary32 values, subnormals included (IEEE 754). */
static int cubic_exponent(gk_real x) {
    int k = 0;
    (void)gk_frexp(x, &k);
    return ((k < -1100) || (k > 1100)) ? 0 : k;
}

/* Scale exponent e with |c2|/2^e, |c1|/2^2e, |c0|/2^3e of order one (only called when needed;
   |e| <= 1100, so 3 e cannot overflow an int). */
static int cubic_scale_exponent(gk_real c2, gk_real c1, gk_real c0) {
    int e = 0;
    int k;
    bool any = false;
    if (cubic_nonzero(c2)) {
        e = cubic_exponent(c2);
        any = true;
    }
    if (cubic_nonzero(c1)) {
        k = cubic_exponent(c1) / 2;
        if (!any || (k > e)) { e = k; }
        any = true;
    }
    if (cubic_nonzero(c0)) {
        k = cubic_exponent(c0) / 3;
        if (!any || (k > e)) { e = k; }
    }
    return e;
}

/* The critical points z1 < z2 of f (roots of 3 z^2 + 2 c2 z + c1, z = (-c2 +- sqrt(D)) / 3,
   D = c2^2 - 3 c1 > 0), cancellation-free: the root of larger magnitude first, the other from
   the product. *sd = sqrt(D). */
static void cubic_critical(const cubic_poly *p, gk_real dd, gk_real *z1, gk_real *z2, gk_real *sd) {
    const gk_real c2 = p->c2;
    const gk_real root_d = gk_sqrt(dd);
    /* 3 (root of larger magnitude), |t| >= sqrt(D) > 0 */
    const gk_real t = -(c2 + gk_copysign(root_d, c2));
    if (t > GK_LIT(0.0)) {
        *z2 = t * CUBIC_THIRD;
        *z1 = p->c1 / t;
    } else {
        *z1 = t * CUBIC_THIRD;
        *z2 = p->c1 / t;
    }
    *sd = root_d;
}

/* The largest root r2 >= z2 when f(z2) = f2 <= 0, where f is convex and increasing: the one
   cubic_descend() found, or from a start above it, at the caller's bound hi or at
   z2 + sqrt(-f(z2)/sqrt(D)) (f(z2 + h) = f(z2) + sqrt(D) h^2 + h^3 exactly, so that point has
   f >= 0). */
static cubic_iter cubic_largest(const cubic_poly *p, const cubic_ctx *c, gk_real z2, gk_real f2,
                                gk_real sd, gk_real *rbig) {
    gk_real x0;
    gk_real up;
    cubic_iter it = CUBIC_CONVERGED;
    if (!cubic_nonzero(f2)) {
        *rbig = z2;
    } else if (c->have_known && (c->rknown > z2)) {
        *rbig = c->rknown;
    } else {
        if (c->have_hi) {
            x0 = c->hstep;
            if (!(x0 > z2)) { x0 = (c->hi > z2) ? c->hi : (z2 + gk_sqrt(-f2 / sd)); }
        } else {
            x0 = z2 + gk_sqrt(-f2 / sd);
        }
        /* an upper end beyond the root also when the caller's estimate is below it */
        up = x0 + (x0 - z2) + GK_LIT(1.0);
        if (c->have_hi && (c->hi > x0)) { up = c->hi + (c->hi - z2) + GK_LIT(1.0); }
        it = cubic_halley(p, x0, z2, up, rbig);
    }
    return it;
}

/* Step 5: three real roots r0 <= z1 <= r1 <= z2 <= r2 = r[2]. The two smaller ones start from the
   deflated quadratic z^2 + (c2 + r2) z - c0/r2 (cancellation-free formula), each then polished on
   the cubic inside its isolating interval. f1 = f(z1), f2 = f(z2). */
static cubic_iter cubic_smaller_roots(const cubic_poly *p, gk_real z1, gk_real z2, gk_real f1,
                                      gk_real f2, gk_real sd, gk_real r[3]) {
    const gk_real rbig = r[2];
    const gk_real e1 = p->c2 + rbig;
    const gk_real e0 = cubic_nonzero(rbig) ? (-p->c0 / rbig) : p->c1;
    gk_real disc = (e1 * e1) - (GK_LIT(4.0) * e0);
    gk_real q, qb, x0l, x0m;
    cubic_iter it = CUBIC_CONVERGED;
    if (disc < GK_LIT(0.0)) { disc = GK_LIT(0.0); }
    q = GK_LIT(-0.5) * (e1 + gk_copysign(gk_sqrt(disc), e1));
    qb = cubic_nonzero(q) ? (e0 / q) : q;
    x0l = (q < qb) ? q : qb;
    x0m = (q < qb) ? qb : q;
    if (!cubic_nonzero(f1)) {
        r[0] = z1;
        r[1] = z1;
    } else {
        if (!(x0l < z1)) { x0l = z1 - gk_sqrt(f1 / sd); /* below the smallest root */ }
        it = cubic_halley(p, x0l, x0l - (z1 - x0l) - GK_LIT(1.0), z1, &r[0]);
        if (!cubic_nonzero(f2)) {
            r[1] = z2;
        } else if (it == CUBIC_CONVERGED) {
            if (!((x0m > z1) && (x0m < z2))) { x0m = GK_LIT(0.5) * (z1 + z2); }
            it = cubic_halley(p, x0m, z1, z2, &r[1]);
        } else {
            /* the smallest root failed: the count is -1 anyway */
        }
    }
    return it;
}

/* Steps 4 and 5 with two critical points z1 < z2 (D = dd > 0). Returns the number of roots
   written to r[] (1 or 3; 0 when the one real root lies below z1 <= lo), -1 when an iteration
   fails. */
static int cubic_isolate_critical(const cubic_poly *p, const cubic_ctx *c, gk_real dd,
                                  gk_real r[3]) {
    gk_real z1, z2, sd, f1, f2, x0;
    int n;
    cubic_iter it = CUBIC_CONVERGED;
    cubic_critical(p, dd, &z1, &z2, &sd);
    f2 = cubic_f(p, z2); /* local minimum */
    if (f2 <= GK_LIT(0.0)) {
        it = cubic_largest(p, c, z2, f2, sd, &r[2]);
        f1 = cubic_f(p, z1); /* local maximum */
        if (it != CUBIC_CONVERGED) {
            n = 0; /* made -1 below */
        } else if ((f1 < GK_LIT(0.0)) || ((c->lo > z1) && (cubic_f(p, c->lo) < GK_LIT(0.0)))) {
            /* one real root; or three, but f(lo) < 0 right of z1 puts lo between the middle and
               the largest root: only the largest is above lo (for an equation of state, B) */
            r[0] = r[2];
            n = 1;
        } else {
            it = cubic_smaller_roots(p, z1, z2, f1, f2, sd, r);
            n = 3;
        }
    } else if (z1 <= c->lo) {
        n = 0; /* one real root, below z1 <= lo */
    } else {
        /* one real root, below z1 (where f is concave and increasing): start below it */
        f1 = cubic_f(p, z1);
        x0 = z1 - gk_sqrt(f1 / sd);
        it = cubic_halley(p, x0, x0 - (z1 - x0) - GK_LIT(1.0), z1, &r[0]);
        n = 1;
    }
    if (it != CUBIC_CONVERGED) { n = -1; }
    return n;
}

/* f monotonic (D <= 0): one real root (triple at D = 0 and f(s) = 0). Returns 1, or -1 when the
   iteration fails. */
static int cubic_isolate_monotonic(const cubic_poly *p, const cubic_ctx *c, gk_real r[3]) {
    const gk_real c2 = p->c2;
    const gk_real s = -c2 * CUBIC_THIRD;
    const gk_real fs = cubic_f(p, s);
    gk_real x0, ds, dist;
    cubic_iter it = CUBIC_CONVERGED;
    if (!CUBIC_ISFINITE(fs)) {
        it = CUBIC_FAILED;
    } else if (!cubic_nonzero(fs)) {
        r[0] = s;
    } else if ((fs < GK_LIT(0.0)) && c->have_known) {
        r[0] = c->rknown; /* the convex iteration converged above s, where f is increasing */
    } else if ((fs < GK_LIT(0.0)) && c->have_hi && (c->hi > s)) {
        /* root above s, where f is convex: from above, at the first step from hi or at hi */
        x0 = (c->hstep > s) ? c->hstep : c->hi;
        it = cubic_halley(p, x0, s, c->hi + (c->hi - s) + GK_LIT(1.0), &r[0]);
    } else if ((fs > GK_LIT(0.0)) && (c->lo < s) && (cubic_f(p, c->lo) < GK_LIT(0.0))) {
        /* root between lo and s, where f is concave: from below, at lo */
        it = cubic_halley(p, c->lo, c->lo - (s - c->lo) - GK_LIT(1.0), s, &r[0]);
    } else {
        /* no bound known: the distance to the root is below cbrt|f(s)| and |f(s)|/f'(s) */
        ds = p->c1 - (c2 * c2 * CUBIC_THIRD); /* f'(s) = -D/3 >= 0 */
        dist = gk_cbrt(gk_fabs(fs));
        if ((ds > GK_LIT(0.0)) && ((gk_fabs(fs) / ds) < dist)) { dist = gk_fabs(fs) / ds; }
        if (fs < GK_LIT(0.0)) {
            x0 = s + dist;
            it = cubic_halley(p, x0, s, x0 + dist + GK_LIT(1.0), &r[0]);
        } else {
            x0 = s - dist;
            it = cubic_halley(p, x0, x0 - dist - GK_LIT(1.0), s, &r[0]);
        }
    }
    return (it == CUBIC_CONVERGED) ? 1 : (-1);
}

/*
 * Isolation at the critical points and the roots from guarded starts (steps 4 and 5 of cubic.h):
 * the general path, for every case the convex iteration alone does not settle. c->rknown is the
 * largest root when the caller already has it from cubic_descend() (c->have_known); it is used
 * where the isolation confirms three real roots or one above z2. Writes up to three roots,
 * ascending, into r[] and returns their number (before the filtering against lo), -1 when an
 * intermediate is not finite or an iteration fails.
 */
static int cubic_isolate(const cubic_poly *p, const cubic_ctx *c, gk_real r[3]) {
    const gk_real dd = (p->c2 * p->c2) - (GK_LIT(3.0) * p->c1);
    int n;
    if (!CUBIC_ISFINITE(dd)) {
        n = -1;
    } else if (dd > GK_LIT(0.0)) {
        n = cubic_isolate_critical(p, c, dd, r);
    } else {
        n = cubic_isolate_monotonic(p, c, r);
    }
    return n;
}

/* Step 1: the exponent e of the power of two that scales z (z = 2^e y) when z^3 could over- or
   underflow, 0 when no scaling is needed. */
static int cubic_scaling(gk_real c2, gk_real c1, gk_real c0) {
    const gk_real big = CUBIC_BIG;
    const gk_real a2 = gk_fabs(c2);
    const gk_real a1 = gk_fabs(c1);
    const gk_real a0 = gk_fabs(c0);
    int e = 0;
    if ((a2 > big) || (a1 > (big * big)) || (a0 > (big * big * big)) ||
        (((a2 < (GK_LIT(1.0) / big)) && (a1 < (GK_LIT(1.0) / (big * big))) &&
          (a0 < (GK_LIT(1.0) / (big * big * big)))) &&
         (cubic_nonzero(c2) || cubic_nonzero(c1) || cubic_nonzero(c0)))) {
        e = cubic_scale_exponent(c2, c1, c0);
    }
    return e;
}

/* Step 2: the caller's estimate of the largest root, or one Householder step of order 4 from the
   upper bound hi, x - f (f'^2 - f f''/2) / (f'^3 - f f' f'' + f^2 f'''/6), with f''' = 6. */
static gk_real cubic_first_step(const cubic_poly *p, gk_real lo, gk_real hi, gk_real guess) {
    gk_real hstep = hi;
    gk_real fh, dh, d2h, num, den;
    if ((guess > lo) && (guess < hi)) {
        hstep = guess;
    } else {
        fh = cubic_f(p, hi);
        dh = cubic_df(p, hi);
        d2h = (GK_LIT(6.0) * hi) + (GK_LIT(2.0) * p->c2);
        num = fh * ((dh * dh) - (GK_LIT(0.5) * fh * d2h));
        den = (dh * ((dh * dh) - (fh * d2h))) + (fh * fh);
        if ((fh > GK_LIT(0.0)) && (dh > GK_LIT(0.0)) && (den > GK_LIT(0.0))) {
            hstep = hi - (num / den);
        }
        if (!(hstep <= hi)) { hstep = hi; }
    }
    return hstep;
}

/* Step 3: f(s) < 0 (s the inflection point): the largest root lies right of s (f(z2) <= f(s) < 0
   when there are critical points), where f is convex and increasing: it is found first, from
   above, without isolating the roots. Returns 1 when that settles the count (one root above lo,
   in r[0]), 0 when the isolation must run (c->rknown kept when found), -1 on failure. */
static int cubic_convex_first(const cubic_poly *p, cubic_ctx *c, gk_real s, gk_real dd,
                              gk_real r[3]) {
    const gk_real x0 = (c->hstep > s) ? c->hstep : c->hi;
    gk_real fl, e1, dq;
    cubic_iter it = CUBIC_LEFT;
    int n = 0;
    if (x0 > s) { it = cubic_descend(p, x0, s, &c->rknown); }
    if (it == CUBIC_FAILED) {
        n = -1;
    } else if (it == CUBIC_CONVERGED) {
        /* The largest root r2 is known. lo right of the local maximum z1 (lo >= s, or
           f'(lo) <= 0) with f(lo) < 0 lies between the middle and the largest root: one root
           above lo. Otherwise the sign of the deflated quadratic's discriminant
           (c2 + r2)^2 + 4 c0 / r2, times r2 (no division), tells whether the other two are
           real; only if they may be does the isolation run. */
        fl = cubic_f(p, c->lo);
        e1 = p->c2 + c->rknown;
        dq = (c->rknown * e1 * e1) + (GK_LIT(4.0) * p->c0);
        c->have_known = true;
        if (!(dd > GK_LIT(0.0)) ||
            ((fl < GK_LIT(0.0)) && ((c->lo >= s) || !(cubic_df(p, c->lo) > GK_LIT(0.0)))) ||
            ((c->rknown > GK_LIT(0.0)) && (dq < GK_LIT(0.0))) ||
            ((c->rknown < GK_LIT(0.0)) && (dq > GK_LIT(0.0)))) {
            r[0] = c->rknown;
            n = 1;
        }
    } else {
        /* not started, or left the convex side: the isolation decides */
    }
    return n;
}

/* Last step: keep the roots above lo, drop repeated values (r[] is compacted in place, unused
   entries 0), undo the scaling, write z[]. Returns the count, or -1 (z[] untouched) when a root
   is not finite. */
static int cubic_output(gk_real r[3], int n, gk_real lo, int e, gk_real z[3]) {
    gk_real v;
    int out = 0;
    int i;
    for (i = 0; i < n; ++i) {
        if (!CUBIC_ISFINITE(r[i])) { return -1; /* before z[] is written */ }
    }
    for (i = 0; i < n; ++i) {
        v = r[i]; /* out <= i: the entries read later are not overwritten */
        if ((v > lo) && ((out == 0) || (v > r[out - 1]))) { /* above lo, not a repeated value */
            r[out] = v;
            out += 1;
        }
    }
    for (i = 0; i < 3; ++i) {
        /* unscaled, a root beyond the largest gk_real (coefficients near it) is not finite */
        v = (i >= out) ? GK_LIT(0.0) : ((e != 0) ? gk_ldexp(r[i], e) : r[i]);
        if (!CUBIC_ISFINITE(v)) { return -1; /* before z[] is written */ }
        r[i] = v;
    }
    z[0] = r[0];
    z[1] = r[1];
    z[2] = r[2];
    return out;
}

/* Finite coefficients; bounds that are not NaN (infinite bounds mean "none"). */
static bool cubic_inputs_ok(gk_real c2, gk_real c1, gk_real c0, gk_real lo, gk_real hi) {
    return CUBIC_ISFINITE(c2) && CUBIC_ISFINITE(c1) && CUBIC_ISFINITE(c0) && !isnan(lo) &&
           !isnan(hi);
}

/* Every root has |z| <= 1 + |c2| + |c1| + |c0| (a Cauchy-type bound, common practice): bounds
   farther out are moved to it, so that no iteration starts at an absurd distance (which would
   cost one step per halving of it). The roots above lo and below hi stay the same. */
static void cubic_clamp_bounds(const cubic_poly *p, cubic_ctx *c) {
    const gk_real bound = GK_LIT(1.0) + gk_fabs(p->c2) + gk_fabs(p->c1) + gk_fabs(p->c0);
    if (c->hi > bound) { c->hi = bound; }
    if (c->lo < -bound) { c->lo = -bound; }
}

int gk__cubic_roots(gk_real c2, gk_real c1, gk_real c0, gk_real lo, gk_real hi, gk_real guess,
                    gk_real z[3]) {
    cubic_poly p;
    cubic_ctx c = { GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0), false, false };
    gk_real r[3] = { GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0) };
    gk_real s, fs, dd, g;
    int n = 0;
    int e;

    if (!cubic_inputs_ok(c2, c1, c0, lo, hi)) { return -1; }
    /* 1. scaling by a power of two (exact) when z^3 could over- or underflow */
    e = cubic_scaling(c2, c1, c0);
    p.c2 = c2;
    p.c1 = c1;
    p.c0 = c0;
    c.lo = lo;
    c.hi = hi;
    g = guess;
    if (e != 0) {
        p.c2 = gk_ldexp(c2, -e);
        p.c1 = gk_ldexp(c1, -2 * e);
        p.c0 = gk_ldexp(c0, -3 * e);
        c.lo = gk_ldexp(lo, -e);
        c.hi = gk_ldexp(hi, -e);
        g = gk_ldexp(guess, -e);
    }
    cubic_clamp_bounds(&p, &c);
    c.have_hi = hi > lo;
    s = -p.c2 * CUBIC_THIRD; /* inflection point: f is convex right of it */
    fs = cubic_f(&p, s);
    dd = (p.c2 * p.c2) - (GK_LIT(3.0) * p.c1); /* > 0: two critical points z1 < s < z2 */

    /* 2. the start for the largest root from above */
    c.hstep = c.have_hi ? cubic_first_step(&p, c.lo, c.hi, g) : c.hi;
    /* 3. the largest root first where f(s) < 0; where f(s) > 0 a root lies left of s, and the
       isolation sorts out the rest */
    if (c.have_hi && (fs < GK_LIT(0.0))) { n = cubic_convex_first(&p, &c, s, dd, r); }
    if ((n == 1) && (e == 0) && (c.rknown > c.lo) && CUBIC_ISFINITE(c.rknown)) {
        /* the common case of an equation of state: one root above lo, no scaling */
        z[0] = c.rknown;
        z[1] = GK_LIT(0.0);
        z[2] = GK_LIT(0.0);
        return 1;
    }
    if (n == 0) { n = cubic_isolate(&p, &c, r); }
    return (n < 0) ? -1 : cubic_output(r, n, c.lo, e, z);
}
