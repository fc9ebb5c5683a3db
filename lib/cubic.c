/*
 * cubic.c - real roots of a monic cubic: the largest root first by an order-4 iteration on the
 * convex side, then (only where more roots may lie above lo) isolation at the critical points and
 * Halley's iteration from guarded starts. Method and error bound: see cubic.h and
 * docs/cubic-solver.md.
 */
#include "cubic.h"

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

/* f(z) by Horner's rule: rounding error below 3u sum |c_i||z|^i (Higham, Accuracy and Stability
   of Numerical Algorithms, 2nd ed., section 5.1). */
static gk_real cubic_f(const cubic_poly *p, gk_real z) {
    return ((z + p->c2) * z + p->c1) * z + p->c0;
}

/* f'(z) = 3 z^2 + 2 c2 z + c1. */
static gk_real cubic_df(const cubic_poly *p, gk_real z) {
    return (GK_LIT(3.0) * z + GK_LIT(2.0) * p->c2) * z + p->c1;
}

static int cubic_nonzero(gk_real x) { return (x < GK_LIT(0.0) || x > GK_LIT(0.0)) ? 1 : 0; }

/*
 * Halley's iteration (cubically convergent: x - f f' / (f'^2 - f f''/2)) from x inside (lo, hi),
 * an interval on which f is monotonic and holds the root. Iterates leaving the interval are
 * pulled back halfway towards its end. Stops when the predicted remaining error C |dx|^3,
 * C = (f''/(2 f'))^2 - f'''/(6 f'), is below one epsilon of x; when |f| stops decreasing
 * (rounding level: the previous point is kept); or after GK_CUBIC_ITER_MAX steps. Near a multiple
 * root (f' -> 0) the prediction is large and the |f| test ends the iteration.
 */
static gk_real cubic_halley(const cubic_poly *p, gk_real x, gk_real lo, gk_real hi) {
    gk_real fx = cubic_f(p, x);
    int i;
    for (i = 0; i < GK_CUBIC_ITER_MAX; ++i) {
        gk_real d1, d2, den, dx, xn, fn;
        if (!cubic_nonzero(fx)) { break; }
        d1 = cubic_df(p, x);
        d2 = GK_LIT(6.0) * x + GK_LIT(2.0) * p->c2;
        den = d1 * d1 - GK_LIT(0.5) * fx * d2;
        if (!cubic_nonzero(den)) { break; }
        dx = fx * d1 / den;
        xn = x - dx;
        if (!(xn > lo && xn < hi)) {
            /* guarded: stay inside the isolating interval */
            xn = (xn <= lo) ? GK_LIT(0.5) * (x + lo) : GK_LIT(0.5) * (x + hi);
            if (!(xn > lo && xn < hi)) { break; }
        } else if (gk_fabs(dx) * dx * dx * (d2 * d2 + GK_LIT(4.0) * gk_fabs(d1)) <=
                   GK_LIT(4.0) * CUBIC_EPS * d1 * d1 * gk_fabs(xn)) {
            x = xn; /* the next correction would be below one rounding unit */
            break;
        }
        fn = cubic_f(p, xn);
        if (i > 0 && !(gk_fabs(fn) < gk_fabs(fx))) { break; /* rounding level reached at x */ }
        x = xn;
        fx = fn;
    }
    return x;
}

/*
 * The largest root from a start x above the inflection point s = -c2/3, where f is convex. Every
 * iterate is checked to stay on the convex and increasing side (x > s and f'(x) > 0). There, right
 * of the local minimum z2, f has at most one root (the largest), so every accepted iterate is on
 * the way to it. Returns 0 (and nothing in *root) when an iterate leaves that side: then the
 * largest root is below s or f has a multiple root near z2, and the caller isolates the roots.
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
 * decreasing (rounding level reached, the previous point is kept), or after GK_CUBIC_ITER_MAX
 * steps.
 */
static int cubic_descend(const cubic_poly *p, gk_real x, gk_real s, gk_real *root) {
    gk_real fx = cubic_f(p, x);
    int i;
    for (i = 0; i < GK_CUBIC_ITER_MAX; ++i) {
        gk_real d1, d1s, d2h, fd, num, den, dx, dx2, xn, fn;
        if (!cubic_nonzero(fx)) { break; }
        d1 = cubic_df(p, x);
        if (!(d1 > GK_LIT(0.0))) { return 0; }
        d2h = GK_LIT(3.0) * x + p->c2; /* f''/2 */
        fd = fx * d2h;
        d1s = d1 * d1;
        num = fx * (d1s - fd);
        den = d1 * (d1s - GK_LIT(2.0) * fd) + fx * fx;
        dx = (den > GK_LIT(0.0)) ? num / den : fx / d1;
        xn = x - dx;
        if (!(xn > s)) { return 0; }
        dx2 = dx * dx;
        if (den > GK_LIT(0.0) && GK_LIT(16.0) * gk_fabs(fd) <= d1s &&
            GK_LIT(16.0) * fx * fx <= d1s * d1 &&
            GK_LIT(2.0) * gk_fabs(d2h * (d2h * d2h - GK_LIT(2.0) * d1)) * (dx2 * dx2) <=
                CUBIC_EPS * gk_fabs(xn) * (d1s * d1)) {
            x = xn; /* the error left is below one rounding unit */
            break;
        }
        fn = cubic_f(p, xn);
        if (i > 0 && !(gk_fabs(fn) < gk_fabs(fx))) { break; /* rounding level reached at x */ }
        x = xn;
        fx = fn;
    }
    *root = x;
    return 1;
}

/* Scale exponent e with |c2|/2^e, |c1|/2^2e, |c0|/2^3e of order one (only called when needed). */
static int cubic_scale_exponent(gk_real c2, gk_real c1, gk_real c0) {
    int e = -10000, k;
    if (cubic_nonzero(c2)) {
        (void)gk_frexp(c2, &k);
        e = k;
    }
    if (cubic_nonzero(c1)) {
        (void)gk_frexp(c1, &k);
        k = k / 2;
        if (k > e) { e = k; }
    }
    if (cubic_nonzero(c0)) {
        (void)gk_frexp(c0, &k);
        k = k / 3;
        if (k > e) { e = k; }
    }
    return e == -10000 ? 0 : e;
}

/*
 * Isolation at the critical points and the roots from guarded starts (steps 4 and 5 of cubic.h):
 * the general path, for every case the convex iteration alone does not settle. rknown: the
 * largest root when the caller already has it from cubic_descend() (have_known = 1); it is
 * used where the isolation confirms three real roots or one above z2. Writes up to three roots,
 * ascending, into r[] and returns their number (before the filtering against lo), -1 when an
 * intermediate is not finite.
 */
static int cubic_isolate(const cubic_poly *p, gk_real lo, gk_real hi, int have_hi, gk_real hstep,
                         int have_known, gk_real rknown, gk_real r[3]) {
    gk_real c2 = p->c2, c1 = p->c1;
    gk_real dd, sd, z1, z2, f1, f2, t;

    /* 4. critical points: 3 z^2 + 2 c2 z + c1 = 0, z = (-c2 +- sqrt(D)) / 3, D = c2^2 - 3 c1 */
    dd = c2 * c2 - GK_LIT(3.0) * c1;
    if (!gk_finite(dd)) { return -1; }
    if (dd > GK_LIT(0.0)) {
        sd = gk_sqrt(dd);
        /* cancellation-free: the root of larger magnitude first, the other from the product */
        t = -(c2 + gk_copysign(sd, c2)); /* = 3 * (root of larger magnitude), |t| >= sd > 0 */
        if (t > GK_LIT(0.0)) {
            z2 = t * CUBIC_THIRD;
            z1 = c1 / t;
        } else {
            z1 = t * CUBIC_THIRD;
            z2 = c1 / t;
        }
        f2 = cubic_f(p, z2); /* local minimum */
        if (f2 <= GK_LIT(0.0)) {
            /* the largest root r2 >= z2, where f is convex and increasing: start above it, at the
               caller's bound hi or at z2 + sqrt(-f(z2)/sqrt(D)) (f(z2 + h) = f(z2) + sqrt(D) h^2
               + h^3 exactly, so that point has f >= 0) */
            gk_real x0, rbig;
            if (!cubic_nonzero(f2)) {
                rbig = z2;
            } else if (have_known && rknown > z2) {
                rbig = rknown;
            } else {
                gk_real up;
                if (have_hi) {
                    x0 = hstep;
                    if (!(x0 > z2)) { x0 = (hi > z2) ? hi : z2 + gk_sqrt(-f2 / sd); }
                } else {
                    x0 = z2 + gk_sqrt(-f2 / sd);
                }
                /* an upper end beyond the root also when the caller's estimate is below it */
                up = x0 + (x0 - z2) + GK_LIT(1.0);
                if (have_hi && hi > x0) { up = hi + (hi - z2) + GK_LIT(1.0); }
                rbig = cubic_halley(p, x0, z2, up);
            }
            f1 = cubic_f(p, z1); /* local maximum */
            if (f1 < GK_LIT(0.0)) {
                r[0] = rbig; /* one real root */
                return 1;
            }
            if (lo > z1 && cubic_f(p, lo) < GK_LIT(0.0)) {
                /* three real roots, but f(lo) < 0 right of z1 puts lo between the middle and the
                   largest root: only the largest is above lo (for an equation of state, B) */
                r[0] = rbig;
                return 1;
            }
            {
                /* 5. three real roots r0 <= z1 <= r1 <= z2 <= r2: the two smaller ones from the
                   deflated quadratic z^2 + (c2 + r2) z - c0/r2 (cancellation-free formula), each
                   then polished on the cubic inside its isolating interval */
                gk_real e1 = c2 + rbig;
                gk_real e0 = cubic_nonzero(rbig) ? -p->c0 / rbig : c1;
                gk_real disc = e1 * e1 - GK_LIT(4.0) * e0;
                gk_real q, qa, qb, x0l, x0m;
                if (disc < GK_LIT(0.0)) { disc = GK_LIT(0.0); }
                q = GK_LIT(-0.5) * (e1 + gk_copysign(gk_sqrt(disc), e1));
                qa = q;
                qb = cubic_nonzero(q) ? e0 / q : q;
                x0l = qa < qb ? qa : qb;
                x0m = qa < qb ? qb : qa;
                r[2] = rbig;
                if (!cubic_nonzero(f1)) {
                    r[0] = z1;
                    r[1] = z1;
                } else {
                    if (!(x0l < z1)) { x0l = z1 - gk_sqrt(f1 / sd); /* below the smallest root */ }
                    r[0] = cubic_halley(p, x0l, x0l - (z1 - x0l) - GK_LIT(1.0), z1);
                    if (!cubic_nonzero(f2)) {
                        r[1] = z2;
                    } else {
                        if (!(x0m > z1 && x0m < z2)) { x0m = GK_LIT(0.5) * (z1 + z2); }
                        r[1] = cubic_halley(p, x0m, z1, z2);
                    }
                }
                return 3;
            }
        }
        /* one real root, below z1 (where f is concave and increasing): start below it */
        if (z1 <= lo) { return 0; }
        f1 = cubic_f(p, z1);
        {
            gk_real x0 = z1 - gk_sqrt(f1 / sd);
            r[0] = cubic_halley(p, x0, x0 - (z1 - x0) - GK_LIT(1.0), z1);
        }
        return 1;
    }
    {
        /* f monotonic: one real root (triple at D = 0 and f(s) = 0) */
        gk_real s = -c2 * CUBIC_THIRD;
        gk_real fs = cubic_f(p, s);
        if (!cubic_nonzero(fs)) {
            r[0] = s;
        } else if (fs < GK_LIT(0.0) && have_known) {
            r[0] = rknown; /* the convex iteration converged above s, where f is increasing */
        } else if (fs < GK_LIT(0.0) && have_hi && hi > s) {
            /* root above s, where f is convex: from above, at the first step from hi or at hi */
            gk_real x0 = hstep > s ? hstep : hi;
            r[0] = cubic_halley(p, x0, s, hi + (hi - s) + GK_LIT(1.0));
        } else if (fs > GK_LIT(0.0) && lo < s && cubic_f(p, lo) < GK_LIT(0.0)) {
            /* root between lo and s, where f is concave: from below, at lo */
            r[0] = cubic_halley(p, lo, lo - (s - lo) - GK_LIT(1.0), s);
        } else {
            /* no bound known: the distance to the root is below cbrt|f(s)| and |f(s)|/f'(s) */
            gk_real ds = c1 - c2 * c2 * CUBIC_THIRD; /* f'(s) = -D/3 >= 0 */
            gk_real dist = gk_cbrt(gk_fabs(fs));
            if (ds > GK_LIT(0.0) && gk_fabs(fs) / ds < dist) { dist = gk_fabs(fs) / ds; }
            if (fs < GK_LIT(0.0)) {
                gk_real x0 = s + dist;
                r[0] = cubic_halley(p, x0, s, x0 + dist + GK_LIT(1.0));
            } else {
                gk_real x0 = s - dist;
                r[0] = cubic_halley(p, x0, x0 - dist - GK_LIT(1.0), s);
            }
        }
        return 1;
    }
}

int gk__cubic_roots(gk_real c2, gk_real c1, gk_real c0, gk_real lo, gk_real hi, gk_real guess,
                    gk_real z[3]) {
    cubic_poly p;
    gk_real r[3] = { GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0) };
    gk_real big = CUBIC_BIG;
    gk_real a2 = gk_fabs(c2), a1 = gk_fabs(c1), a0 = gk_fabs(c0);
    gk_real hstep = hi, s, fs, dd, rknown = GK_LIT(0.0);
    int n = -2, e = 0, i, out, have_known = 0;
    int have_hi = (hi > lo) ? 1 : 0;

    if (!gk_finite(c2) || !gk_finite(c1) || !gk_finite(c0) || isnan(lo) || isnan(hi)) { return -1; }

    /* 1. scaling by a power of two (exact) when z^3 could over- or underflow */
    if (a2 > big || a1 > big * big || a0 > big * big * big ||
        ((a2 < GK_LIT(1.0) / big && a1 < GK_LIT(1.0) / (big * big) &&
          a0 < GK_LIT(1.0) / (big * big * big)) &&
         (cubic_nonzero(c2) || cubic_nonzero(c1) || cubic_nonzero(c0)))) {
        e = cubic_scale_exponent(c2, c1, c0);
        c2 = gk_ldexp(c2, -e);
        c1 = gk_ldexp(c1, -2 * e);
        c0 = gk_ldexp(c0, -3 * e);
        lo = gk_ldexp(lo, -e);
        hi = gk_ldexp(hi, -e);
        guess = gk_ldexp(guess, -e);
    }
    p.c2 = c2;
    p.c1 = c1;
    p.c0 = c0;
    s = -c2 * CUBIC_THIRD; /* inflection point: f is convex right of it */
    fs = cubic_f(&p, s);
    dd = c2 * c2 - GK_LIT(3.0) * c1; /* > 0: two critical points z1 < s < z2 */

    /* 2. the caller's estimate of the largest root, or one Householder step of order 4 from the
       upper bound hi, x - f (f'^2 - f f''/2) / (f'^3 - f f' f'' + f^2 f'''/6), with f''' = 6 */
    if (have_hi && guess > lo && guess < hi) {
        hstep = guess;
    } else if (have_hi) {
        gk_real fh = cubic_f(&p, hi), dh = cubic_df(&p, hi);
        gk_real d2h = GK_LIT(6.0) * hi + GK_LIT(2.0) * c2;
        gk_real num = fh * (dh * dh - GK_LIT(0.5) * fh * d2h);
        gk_real den = dh * (dh * dh - fh * d2h) + fh * fh;
        hstep = (fh > GK_LIT(0.0) && dh > GK_LIT(0.0) && den > GK_LIT(0.0)) ? hi - num / den : hi;
        if (!(hstep <= hi)) { hstep = hi; }
    }

    /* 3. f(s) < 0: the largest root lies right of s (f(z2) <= f(s) < 0 when there are critical
       points), where f is convex and increasing: it is found first, from above, without
       isolating the roots. f(s) > 0: a root lies left of s, and the isolation sorts out the
       rest. */
    if (have_hi && fs < GK_LIT(0.0)) {
        gk_real x0;
        x0 = hstep > s ? hstep : hi;
        if (x0 > s && cubic_descend(&p, x0, s, &rknown)) {
            /* The largest root r2 is known. lo right of the local maximum z1 (lo >= s, or
               f'(lo) <= 0) with f(lo) < 0 lies between the middle and the largest root: one root
               above lo. Otherwise the sign of the deflated quadratic's discriminant
               (c2 + r2)^2 + 4 c0 / r2, times r2 (no division), tells whether the other two are
               real; only if they may be does the isolation below run. */
            gk_real fl = cubic_f(&p, lo), e1 = c2 + rknown;
            gk_real dq = rknown * e1 * e1 + GK_LIT(4.0) * c0;
            have_known = 1;
            if (!(dd > GK_LIT(0.0)) ||
                (fl < GK_LIT(0.0) && (lo >= s || !(cubic_df(&p, lo) > GK_LIT(0.0)))) ||
                (rknown > GK_LIT(0.0) && dq < GK_LIT(0.0)) ||
                (rknown < GK_LIT(0.0) && dq > GK_LIT(0.0))) {
                r[0] = rknown;
                n = 1;
            }
        }
    }
    if (n == 1 && e == 0 && rknown > lo && gk_finite(rknown)) {
        /* the common case of an equation of state: one root above lo, no scaling */
        z[0] = rknown;
        z[1] = GK_LIT(0.0);
        z[2] = GK_LIT(0.0);
        return 1;
    }
    if (n == -2) { n = cubic_isolate(&p, lo, hi, have_hi, hstep, have_known, rknown, r); }
    if (n < 0) { return -1; }

    /* undo the scaling, keep the roots above lo, drop repeated values */
    out = 0;
    for (i = 0; i < n; ++i) {
        if (!gk_finite(r[i])) { return -1; /* before z[] is written */ }
    }
    for (i = 0; i < n; ++i) {
        gk_real v = r[i];
        if (!(v > lo)) { continue; }
        if (out > 0 && !(v > r[out - 1])) { continue; /* equal to the previous one */ }
        r[out++] = v; /* out <= i: compacts r[] in place */
    }
    for (i = 0; i < 3; ++i) {
        gk_real v = (i < out) ? r[i] : GK_LIT(0.0);
        z[i] = (e != 0 && i < out) ? gk_ldexp(v, e) : v;
    }
    return out;
}
