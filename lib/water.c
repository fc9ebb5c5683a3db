/*
 * water.c - vapour pressure of water and ice, its inverse, dew/frost point, dry-gas pressure.
 *
 * Over liquid water (273.16 K ... 647.096 K): IAPWS-IF97 region 4, the saturation-pressure
 * equation (eq. 30) and its backward equation for the saturation temperature (eq. 31),
 * IAPWS, "Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic
 * Properties of Water and Steam" (2007). IF97 states the equation from 273.15 K; gaskit uses it
 * from the triple point 273.16 K, where it meets the ice curve (at 273.16 K the two curves
 * differ by 2e-11 relative, computed with mpmath 1.3.0 at 40 digits).
 *
 * Over ice (200 K ... 273.16 K): IAPWS R14-08(2011), "Revised Release on the Pressure along the
 * Melting and Sublimation Curves of Ordinary Water Substance", sublimation-pressure equation
 * ln(p/pt) = theta^-1 sum a_i theta^b_i, theta = T / 273.16 K (valid there from 50 K; gaskit
 * stops at 200 K). Its inverse has no closed form: a guarded Newton iteration on ln p with a
 * bisection fallback, bracketed in [200 K, 273.16 K].
 *
 * Error budget (double): IF97 eq. 30 is written in the release's own stable form (the root of
 * the quadratic is taken as 2C / (-B + sqrt(B^2 - 4AC)), where -B > 0 and -4AC > 0 in the whole
 * range, so no subtraction of near-equal terms in the denominator); the polynomials A, B, C
 * cancel by a factor of at most ~10 and the fourth power multiplies the relative error by 4,
 * so the result is good to ~1e-14. Float build: the same steps in binary32 lose up to ~1e-5
 * relative (measured in tests/test_water.c over the whole curve); the sublimation equation to
 * ~2e-6 relative (see subl_ln_ratio()).
 */
#include <stdbool.h>

#include "gk_internal.h"

/* IAPWS-IF97 (Revised Release 2007), Table 34: coefficients n1 ... n10 of region 4. */
#define N1 GK_LIT(0.11670521452767e4)
#define N2 GK_LIT(-0.72421316703206e6)
#define N3 GK_LIT(-0.17073846940092e2)
#define N4 GK_LIT(0.12020824702470e5)
#define N5 GK_LIT(-0.32325550322333e7)
#define N6 GK_LIT(0.14915108613530e2)
#define N7 GK_LIT(-0.48232657361591e4)
#define N8 GK_LIT(0.40511340542057e6)
#define N9 GK_LIT(-0.23855557567849)
#define N10 GK_LIT(0.65017534844798e3)

/* IAPWS R14-08(2011), sublimation pressure, coefficients a_i and exponents b_i. */
#define SUB_A1 GK_LIT(-0.212144006e2)
#define SUB_A2 GK_LIT(0.273203819e2)
#define SUB_A3 GK_LIT(-0.610598130e1)
#define SUB_B1 GK_LIT(0.333333333e-2)
#define SUB_B2 GK_LIT(0.120666667e1)
#define SUB_B3 GK_LIT(0.170333333e1)

/* Triple point of water: 273.16 K, 611.657 Pa (IAPWS R14-08(2011), reference values Tt, pt). */
#define T_TRIPLE GK_LIT(273.16)
#define P_TRIPLE GK_LIT(611.657)
/* Critical temperature of water, 647.096 K (IAPWS R2-83(1992), also IF97). */
#define T_CRIT GK_LIT(647.096)
/* Lower end of gaskit's ice curve (a design choice of gaskit, inside the release's 50 K). */
#define T_LOW GK_LIT(200.0)
/* The pressure range of the inverse: the forward equations at the ends, eq. 30 at 647.096 K
   = 22064000.000321 Pa and R14-08 at 200 K = 0.162604017609 Pa (both mpmath 1.3.0, 40 digits),
   widened by 64 units of rounding of gk_real so that every output of
   gk_water_vapour_pressure() inverts, whatever the rounding of the forward equation in this
   build (a float build rounds eq. 30 to ~5e-6; a compiler may also fuse a*b+c into an fma). */
#define P_HIGH (GK_LIT(22064000.000321) * (GK_LIT(1.0) + GK_LIT(64.0) * GK_REAL_EPS))
#define P_LOW (GK_LIT(0.162604017609) * (GK_LIT(1.0) - GK_LIT(64.0) * GK_REAL_EPS))

/* IF97 eq. 30: saturation pressure in Pa, for T in [273.15, 647.096] K (not checked here). */
static gk_real if97_ps(gk_real t) {
    const gk_real theta = t + N9 / (t - N10);
    const gk_real a = (theta + N1) * theta + N2;
    const gk_real b = (N3 * theta + N4) * theta + N5;
    const gk_real c = (N6 * theta + N7) * theta + N8;
    const gk_real r = GK_LIT(2.0) * c / (-b + gk_sqrt(b * b - GK_LIT(4.0) * a * c));
    const gk_real r2 = r * r;
    return r2 * r2 * GK_LIT(1.0e6); /* the equation gives MPa */
}

/* IF97 eq. 31: saturation temperature in K, for p in [611.213 Pa, 22.064 MPa] (not checked). */
static gk_real if97_ts(gk_real p_pa) {
    const gk_real beta = gk_sqrt(gk_sqrt(p_pa * GK_LIT(1.0e-6))); /* (p / 1 MPa)^(1/4) */
    const gk_real e = (beta + N3) * beta + N6;
    const gk_real f = (N1 * beta + N4) * beta + N7;
    const gk_real g = (N2 * beta + N5) * beta + N8;
    const gk_real d = GK_LIT(2.0) * g / (-f - gk_sqrt(f * f - GK_LIT(4.0) * e * g));
    /* Eq. 31 reads T = (n10 + D - sqrt((n10 + D)^2 - 4 (n9 + n10 D))) / 2. Its discriminant
       is rewritten with the exact identity (n10 + D)^2 - 4 (n9 + n10 D) = (n10 - D)^2 - 4 n9:
       the original form subtracts two numbers near 1.7e6 to get about 1e2 near the critical
       point (losing 4 digits, which a float build cannot spare); the rewritten one adds two
       positive terms (n9 < 0). */
    const gk_real m = N10 - d;
    return (N10 + d - gk_sqrt(m * m - GK_LIT(4.0) * N9)) * GK_LIT(0.5);
}

/* expm1 and log1p in gk_real precision (C99 <math.h>). */
#if GK_REAL_IS_FLOAT
#  define w_expm1 expm1f
#  define w_log logf
#else
#  define w_expm1 expm1
#  define w_log log
#endif

/*
 * R14-08(2011): ln(p_subl / pt) at theta = T / Tt, and its derivative d/dT.
 * The published a_i sum to exactly zero (-21.2144006 + 27.3203819 - 6.10598130 = 0), so
 * sum a_i theta^b_i = sum a_i (theta^b_i - 1) = sum a_i expm1(b_i ln theta): the same value,
 * without the cancellation of terms near 27 to a sum near 0 (this keeps a float build to
 * ~1e-6 in ln p instead of ~5e-6, and makes the curve end at exactly pt at 273.16 K).
 */
static gk_real subl_ln_ratio(gk_real t, gk_real *dlnp_dt) {
    const gk_real theta = t / T_TRIPLE;
    const gk_real l = w_log(theta);
    const gk_real e1 = w_expm1(SUB_B1 * l);
    const gk_real e2 = w_expm1(SUB_B2 * l);
    const gk_real e3 = w_expm1(SUB_B3 * l);
    if (dlnp_dt != NULL) {
        /* d/dtheta [theta^-1 sum a (theta^b - 1)] = theta^-2 sum a ((b - 1) theta^b + 1)
           = theta^-2 sum a (b - 1) theta^b, again because sum a = 0. */
        *dlnp_dt = (SUB_A1 * (SUB_B1 - GK_LIT(1.0)) * (GK_LIT(1.0) + e1) +
                    SUB_A2 * (SUB_B2 - GK_LIT(1.0)) * (GK_LIT(1.0) + e2) +
                    SUB_A3 * (SUB_B3 - GK_LIT(1.0)) * (GK_LIT(1.0) + e3)) /
                   (theta * theta * T_TRIPLE);
    }
    return (SUB_A1 * e1 + SUB_A2 * e2 + SUB_A3 * e3) / theta;
}

static gk_real subl_p(gk_real t) { return P_TRIPLE * gk_exp(subl_ln_ratio(t, NULL)); }

/* Steps of the frost-point inverse. Bisection halves the bracket [200 K, 273.16 K] and a Newton
   step inside it converges quadratically; the stopping test (a step below 4 units of rounding of
   T) needs at most 49 halvings of 73.16 K in binary64 (22 in binary32), so 60 steps are a safe
   cap. A run that reaches it reports GK_ERR_NO_SOLUTION rather than an unconverged value. */
#define SUBL_ITER_MAX 60
/* A lower bound of d ln p_subl / dT over [200 K, 273.16 K] with a wide margin (the slope is
   L_subl / (R T^2) = 0.08 ... 0.15 1/K there; common practice: Clausius-Clapeyron). */
#define SUBL_SLOPE_MIN GK_LIT(0.01)

/* Inverse of the sublimation curve for p in [p_subl(200 K), pt]: guarded Newton on ln p from
   inside the bracket [200 K, 273.16 K]. GK_OK with *t_out; GK_ERR_NO_SOLUTION if SUBL_ITER_MAX
   steps pass without the stopping test. */
static gk_status subl_t(gk_real p_pa, gk_real *t_out) {
    const gk_real target = gk_log(p_pa / P_TRIPLE);
    gk_real lo = T_LOW;
    gk_real hi = T_TRIPLE;
    /* Fixed start inside the bracket (a design choice, not a published value); a Newton step
       that leaves the bracket is replaced by bisection below, so the start only sets the
       iteration count. */
    gk_real t = GK_LIT(250.0);
    gk_real slope;
    gk_real f;
    gk_real next;
    int i;
    bool converged = false;
    for (i = 0; (i < SUBL_ITER_MAX) && !converged; ++i) {
        f = subl_ln_ratio(t, &slope) - target;
        if (f > GK_LIT(0.0)) {
            hi = t;
        } else {
            lo = t;
        }
        /* Newton's step where the slope is safely positive (d ln p / dT is 0.08 ... 0.15 1/K on
           this curve: above SUBL_SLOPE_MIN always), bisection where the step leaves the bracket */
        next = (slope > SUBL_SLOPE_MIN) ? (t - (f / slope)) : t;
        if (!((next > lo) && (next < hi))) { next = GK_LIT(0.5) * (lo + hi); }
        converged = gk_fabs(next - t) <= (GK_LIT(4.0) * GK_REAL_EPS * t);
        t = next;
    }
    if (!converged) { return GK_ERR_NO_SOLUTION; }
    *t_out = t;
    return GK_OK;
}

gk_status gk_water_vapour_pressure(gk_temperature t, gk_pressure *out) {
    gk_real p;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(t.k)) { return GK_ERR_DOMAIN; }
    if (t.k < T_LOW || t.k > T_CRIT) { return GK_ERR_RANGE; }
    p = (t.k >= T_TRIPLE) ? if97_ps(t.k) : subl_p(t.k);
    if (!gk_positive(p)) { return GK_ERR_RANGE; }
    out->pa = p;
    return GK_OK;
}

gk_status gk_water_saturation_temperature(gk_pressure p, gk_temperature *out) {
    gk_real t = GK_LIT(0.0);
    gk_status s;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(p.pa)) { return GK_ERR_DOMAIN; }
    if (p.pa >= P_TRIPLE) {
        if (p.pa > P_HIGH) { return GK_ERR_RANGE; }
        t = if97_ts(p.pa);
        /* At pt eq. 31 gives 273.16 K minus 2.4e-10 K (mpmath): keep the liquid side. */
        if (t < T_TRIPLE) { t = T_TRIPLE; }
        if (t > T_CRIT) { t = T_CRIT; }
    } else {
        if (p.pa < P_LOW) { return GK_ERR_RANGE; }
        s = subl_t(p.pa, &t);
        if (s != GK_OK) { return s; }
    }
    if (!gk_positive(t)) { return GK_ERR_RANGE; }
    out->k = t;
    return GK_OK;
}

gk_status gk_dew_point(gk_pressure water_partial_pressure, gk_temperature *out) {
    /* The dew point is where the water partial pressure equals the saturation pressure: over
       liquid water above 611.657 Pa, else the frost point over ice. */
    return gk_water_saturation_temperature(water_partial_pressure, out);
}

gk_status gk_dry_gas_pressure(gk_pressure total, gk_temperature t, gk_real relative_humidity,
                              gk_pressure *out) {
    gk_pressure pws = { GK_LIT(0.0) };
    gk_real pw;
    gk_status s;
    if (out == NULL) { return GK_ERR_ARGUMENT; }
    if (!gk_positive(total.pa) || !gk_positive(t.k) || !gk_finite(relative_humidity) ||
        relative_humidity < GK_LIT(0.0) || relative_humidity > GK_LIT(1.0)) {
        return GK_ERR_DOMAIN;
    }
    s = gk_water_vapour_pressure(t, &pws);
    if (s != GK_OK) { return s; }
    pw = relative_humidity * pws.pa;
    if (!(pw < total.pa)) { return GK_ERR_NO_SOLUTION; }
    out->pa = total.pa - pw;
    return GK_OK;
}
