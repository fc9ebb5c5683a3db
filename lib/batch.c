/*
 * batch.c - the array calls of batch.h: ideal-gas density, the dry-gas pressure of wet gases,
 * and density, Z, vessel contents and flows of a gas or mixture under a model.
 *
 * gk_ideal_density_batch() computes each block of elements in one loop without branches that
 * compilers vectorise: the density (p / R)(M / T), the same product of ratios as the fast path
 * of the scalar call (gk_scaled_product(), gk_scaled.h), and beside it the check that every
 * input lies inside that fast path's bound, so that the bits agree. A block where the check
 * fails is recomputed element by element, through gk_ideal_density() for the elements outside
 * the bound (zero, negative, not finite, subnormal or extreme inputs).
 *
 * The fluid calls open the fluid once per array in the fluid layer (fluid.h: the model, the
 * composition, the gas data and k_ij checked once), form once what every element shares (the
 * molar mass, Z at the reference condition), and then give each element the result and status
 * of the scalar function, with its formulas and its order of checks (see batch.h).
 */
#include <stdbool.h>
#include <stdint.h>
#include "gk_scaled.h"
#include "fluid.h"

/* Elements computed and checked together: small enough that a block recomputed after a failed
   check reads its inputs from the first level of cache, large enough to amortise the loop. */
#define GK_BATCH_BLOCK 256u

/* A quiet NaN in gk_real; NAN is a float constant (C99 7.12), the cast keeps
   -Wdouble-promotion quiet. */
#define GK_BATCH_NAN ((gk_real)NAN)

/* Does x lie in [lo, hi]? False for NaN. */
static inline bool in_bound(gk_real x, gk_real lo, gk_real hi) { return x >= lo && x <= hi; }

/*
 * The check in the loop of a block compares integer keys, which compilers vectorise (a compare of
 * floating values may raise the invalid exception on a NaN, so they do not if-convert it):
 * the key of a gk_real is its upper 32 bits, sign, exponent and leading fraction bits (IEEE
 * 754 binary64 and binary32, common practice). For x >= +0 the key grows with x; a negative
 * x has the sign bit set, a NaN or an infinity the largest exponent. With lo and hi exact
 * powers of two (fraction bits 0), key(lo) <= key(x) < key(hi) holds exactly when
 * lo <= x < hi: the unsigned difference key(x) - key(lo) is below key(hi) - key(lo) for those
 * x only. Assumes a gk_real stored with the byte order of the integer of its size, as on
 * every target gaskit supports.
 */
#if defined(__FLOAT_WORD_ORDER__) && defined(__BYTE_ORDER__)
#  if __FLOAT_WORD_ORDER__ != __BYTE_ORDER__
#    error "gaskit batch.c: floating-point word order differs from the integer byte order"
#  endif
#endif
static inline uint32_t real_key(gk_real x) {
#if GK_REAL_IS_FLOAT
    union {
        float r;
        uint32_t u;
    } v;
    v.r = x;
    return v.u;
#else
    union {
        double r;
        uint64_t u;
    } v;
    v.r = x;
    return (uint32_t)(v.u >> 32);
#endif
}

/* One block whose output overlaps no input: rho = (p / R)(M / T), the scalar fast path's
   formula, for every element without a branch, and in the same loop the check that every p
   and t lies in [lo, hi) (key_lo = real_key(lo), span = real_key(hi) - key_lo). Returns the
   check; when it fails the caller recomputes the block element by element (the inputs are
   intact). Inlined with n = GK_BATCH_BLOCK for a full block, so that the trip count is a
   constant (compilers then vectorise it also at -O2, with no remainder loop). */
static inline bool ideal_block(size_t n, const gk_real *p, const gk_real *t, gk_real m,
                               uint32_t key_lo, uint32_t span, gk_real *out) {
    size_t i;
    uint32_t worst = 0u;
    for (i = 0; i < n; ++i) {
        const uint32_t a = real_key(p[i]) - key_lo, b = real_key(t[i]) - key_lo;
        worst = (a > worst) ? a : worst;
        worst = (b > worst) ? b : worst;
        out[i] = (p[i] / GK_R) * (m / t[i]);
    }
    return worst < span;
}

/* A block with some element outside the bound (or a molar mass outside it): element by
   element, the fast formula where p, T and M lie inside the bound and gk_ideal_density()
   elsewhere. Returns the number of GK_OK elements. */
static size_t ideal_block_mixed(size_t n, const gk_real *p, const gk_real *t, gk_molar_mass m,
                                gk_real lo, gk_real hi, gk_real *out, gk_status *st) {
    const bool m_in = in_bound(m.kg_per_mol, lo, hi);
    size_t i, ok = 0;
    for (i = 0; i < n; ++i) {
        const gk_real pi = p[i], ti = t[i];
        gk_status s = GK_OK;
        gk_real r;
        if (m_in && in_bound(pi, lo, hi) && in_bound(ti, lo, hi)) {
            r = (pi / GK_R) * (m.kg_per_mol / ti);
        } else {
            gk_density rho = { GK_LIT(0.0) };
            gk_pressure pp;
            gk_temperature tt;
            pp.pa = pi;
            tt.k = ti;
            s = gk_ideal_density(pp, tt, m, &rho);
            r = (s == GK_OK) ? rho.kg_per_m3 : GK_BATCH_NAN;
        }
        out[i] = r;
        if (st != NULL) { st[i] = s; }
        ok += (s == GK_OK) ? 1u : 0u;
    }
    return ok;
}

/* Status GK_OK for n elements. */
static void fill_ok(size_t n, gk_status *st) {
    size_t i;
    for (i = 0; i < n; ++i) { st[i] = GK_OK; }
}

/* Every element fails with status s: NaN in each non-NULL output, s in status_out. */
static size_t fail_all(size_t count, gk_status s, gk_real *out1, gk_real *out2, gk_real *out3,
                       gk_status *status_out) {
    size_t i;
    for (i = 0; i < count; ++i) {
        if (out1 != NULL) { out1[i] = GK_BATCH_NAN; }
        if (out2 != NULL) { out2[i] = GK_BATCH_NAN; }
        if (out3 != NULL) { out3[i] = GK_BATCH_NAN; }
        if (status_out != NULL) { status_out[i] = s; }
    }
    return 0;
}

size_t gk_ideal_density_batch(size_t count, const gk_real *p_pa, const gk_real *t_k,
                              gk_molar_mass m, gk_real *out_kg_per_m3, gk_status *status_out) {
    /* The bound of gk_scaled_product() for two ratios: inside it the scalar call takes its
       fast path, which computes exactly (p / R)(M / T). R lies inside it. */
    const gk_real hi = gk_scaled_bound(2);
    const gk_real lo = GK_LIT(1.0) / hi;
    const uint32_t key_lo = real_key(lo), span = real_key(hi) - key_lo;
    size_t base, n = 0, ok = 0;
    bool fast;
    if (p_pa == NULL || t_k == NULL || out_kg_per_m3 == NULL) {
        return fail_all(count, GK_ERR_ARGUMENT, out_kg_per_m3, NULL, NULL, status_out);
    }
    if (!gk_positive(m.kg_per_mol)) {
        return fail_all(count, GK_ERR_DOMAIN, out_kg_per_m3, NULL, NULL, status_out);
    }
    /* in place (out is p or t): element by element, which reads each input before writing */
    fast = in_bound(m.kg_per_mol, lo, hi) && out_kg_per_m3 != p_pa && out_kg_per_m3 != t_k;
    for (base = 0; base < count; base += n) {
        const size_t rest = count - base;
        const gk_real *p = &p_pa[base], *t = &t_k[base];
        gk_real *out = &out_kg_per_m3[base];
        gk_status *st = (status_out != NULL) ? &status_out[base] : NULL;
        bool done = false;
        n = (rest < GK_BATCH_BLOCK) ? rest : GK_BATCH_BLOCK;
        if (fast) {
            /* a full block with the constant trip count, which compilers vectorise at -O2 */
            done = (n == GK_BATCH_BLOCK)
                       ? ideal_block(GK_BATCH_BLOCK, p, t, m.kg_per_mol, key_lo, span, out)
                       : ideal_block(n, p, t, m.kg_per_mol, key_lo, span, out);
        }
        if (done) {
            if (st != NULL) { fill_ok(n, st); }
            ok += n;
        } else {
            ok += ideal_block_mixed(n, p, t, m, lo, hi, out, st);
        }
    }
    return ok;
}

size_t gk_dry_gas_pressure_batch(size_t count, const gk_real *p_pa, const gk_real *t_k,
                                 const gk_real *relative_humidity, gk_real *out_pa,
                                 gk_status *status_out) {
    size_t i, ok = 0;
    if (p_pa == NULL || t_k == NULL || relative_humidity == NULL || out_pa == NULL) {
        return fail_all(count, GK_ERR_ARGUMENT, out_pa, NULL, NULL, status_out);
    }
    for (i = 0; i < count; ++i) {
        gk_pressure p, dry = { GK_LIT(0.0) };
        gk_temperature t;
        gk_status s;
        p.pa = p_pa[i];
        t.k = t_k[i];
        s = gk_dry_gas_pressure(p, t, relative_humidity[i], &dry);
        out_pa[i] = (s == GK_OK) ? dry.pa : GK_BATCH_NAN;
        if (status_out != NULL) { status_out[i] = s; }
        ok += (s == GK_OK) ? 1u : 0u;
    }
    return ok;
}

/* ------------------------------------------------------------------ gas or mixture */

/* The quantity one element of a fluid call computes. */
typedef enum batch_op {
    BATCH_DENSITY,
    BATCH_Z,
    BATCH_CONTENTS,
    BATCH_FLOW_TO_REFERENCE,
    BATCH_FLOW_TO_MASS
} batch_op;

/* One call: the fluid opened once, what every element shares, and the arrays. */
typedef struct batch_job {
    gk__fluid fluid;  /* checked once for the whole array */
    gk_reference ref; /* the reference condition (contents, reference flow) */
    gk_real m;        /* molar mass, kg/mol (density, contents, mass flow) */
    gk_real z_ref;    /* Z at the reference condition (contents, reference flow) */
    batch_op op;
    gk_status m_status;     /* of the molar mass: for every element with valid readings */
    gk_status z_ref_status; /* of Z at the reference: for every element whose own Z is found */
    const gk_real *x;       /* volumes or flows; NULL for density and Z */
    const gk_real *p;       /* pressures, Pa */
    const gk_real *t;       /* temperatures, K */
    gk_real *out[3];        /* results; out[1], out[2] may be NULL */
    gk_status *status;      /* may be NULL */
} batch_job;

/* Density or Z at one state: the stable root (gas or liquid), as gk_eos_density() and
   gk_fluid_z() compute them. */
static gk_status element_root(const batch_job *job, gk_pressure p, gk_temperature t, gk_real *r) {
    gk_eos_result e;
    gk_real d;
    const gk_status s = gk__fluid_state(&job->fluid, p, t, GK_ROOT_STABLE, &e);
    if (s != GK_OK) { return s; }
    if (job->op == BATCH_Z) {
        *r = e.z;
        return GK_OK;
    }
    d = job->m / e.molar_volume.m3_per_mol;
    if (!gk_positive(d)) { return GK_ERR_RANGE; }
    *r = d;
    return GK_OK;
}

/* The status of element i's readings and of the molar mass, in the order of the scalar
   functions' checks: volume or flow, p, T, then the molar mass. */
static gk_status amount_readings(const batch_job *job, size_t i) {
    const gk_real x = job->x[i];
    const bool readings = ((job->op == BATCH_CONTENTS) ? gk_positive(x) : gk_finite(x)) &&
                          gk_positive(job->p[i]) && gk_positive(job->t[i]);
    return readings ? job->m_status : GK_ERR_DOMAIN;
}

/* Contents, reference flow or mass flow of element i from its Z, with the formulas of
   gk_vessel_contents(), gk_flow_to_reference() and gk_flow_to_mass(). */
static gk_status amount_of(const batch_job *job, size_t i, gk_real z, gk_real r[3]) {
    const gk_real x = job->x[i];
    const gk_pressure p = { job->p[i] };
    const gk_temperature t = { job->t[i] };
    gk_real factor = GK_LIT(1.0), n, rho;
    gk_status s;
    switch (job->op) {
        case BATCH_FLOW_TO_REFERENCE:
            /* q_ref = q (p / p_ref)(T_ref / T)(Z_ref / Z) */
            s = gk_reference_factor(p, t, z, job->ref, job->z_ref, &factor);
            r[0] = x * factor;
            return (s != GK_OK) ? s : gk_check_result(r[0]);
        case BATCH_FLOW_TO_MASS:
            /* w = q rho, rho = p M / (Z R T) */
            rho = (p.pa / (z * GK_R * t.k)) * job->m;
            r[0] = x * rho;
            return (gk_positive(rho) && gk_finite(r[0])) ? GK_OK : GK_ERR_RANGE;
        default:
            /* n = p V / (Z R T), mass n M, reference volume n Z_ref R T_ref / p_ref */
            n = (p.pa / (z * GK_R * t.k)) * x;
            r[0] = n;
            r[1] = n * job->m;
            r[2] = n * (job->z_ref * GK_R * job->ref.t.k / job->ref.p.pa);
            return (gk_positive(r[0]) && gk_positive(r[1]) && gk_positive(r[2])) ? GK_OK
                                                                                 : GK_ERR_RANGE;
    }
}

/* Writes element i: its results (NaN on failure) and its status. 1 when the status is GK_OK. */
static size_t element_put(const batch_job *job, size_t i, gk_status s, const gk_real r[3]) {
    int k;
    for (k = 0; k < 3; ++k) {
        if (job->out[k] != NULL) { job->out[k][i] = (s == GK_OK) ? r[k] : GK_BATCH_NAN; }
    }
    if (job->status != NULL) { job->status[i] = s; }
    return (s == GK_OK) ? 1u : 0u;
}

/* The elements of a density or Z call. Each element's inputs are read before its outputs are
   written, so an output may be an input array (in place). Returns the number of GK_OK. */
static size_t run_roots(const batch_job *job, size_t count) {
    size_t i, ok = 0;
    for (i = 0; i < count; ++i) {
        gk_real r[3] = { GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0) };
        gk_pressure p;
        gk_temperature t;
        p.pa = job->p[i];
        t.k = job->t[i];
        ok += element_put(job, i, element_root(job, p, t, &r[0]), r);
    }
    return ok;
}

/* Element i of a contents or flow call from its status so far and its Z: the result, then the
   outputs (its inputs are read before its outputs are written). Out of line: the results are
   not in the frame that holds the loop over the state solves (firmware stack budget). */
static GK_NOINLINE size_t amount_put(const batch_job *job, size_t i, gk_status s, gk_real z) {
    gk_real r[3] = { GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0) };
    const gk_status st = (s == GK_OK) ? amount_of(job, i, z, r) : s;
    return element_put(job, i, st, r);
}

/* The elements of a contents or flow call, with the order of statuses of the scalar
   functions: the readings, the molar mass, Z at (p, T), Z at the reference, the result. */
static size_t run_amounts(const batch_job *job, size_t count) {
    size_t i, ok = 0;
    for (i = 0; i < count; ++i) {
        gk_real z = GK_LIT(1.0);
        gk_status s = amount_readings(job, i);
        if (s == GK_OK) {
            const gk_pressure p = { job->p[i] };
            const gk_temperature t = { job->t[i] };
            s = gk__fluid_gas_z(&job->fluid, p, t, &z);
        }
        if (s == GK_OK) { s = job->z_ref_status; }
        ok += amount_put(job, i, s, z);
    }
    return ok;
}

/* What the whole array shares, once: the molar mass (density, contents, mass flow) and Z at
   the reference condition (contents, reference flow). A reference that is not physical fails
   every element (GK_ERR_DOMAIN, as the scalar call), and so does a molar mass that is not
   valid for the density (the scalar call checks it before the state); other statuses are kept
   for the elements, which report them in the scalar call's order. */
static gk_status batch_shared(batch_job *job) {
    const bool uses_ref = job->op == BATCH_CONTENTS || job->op == BATCH_FLOW_TO_REFERENCE;
    if (uses_ref && (!gk_positive(job->ref.p.pa) || !gk_positive(job->ref.t.k))) {
        return GK_ERR_DOMAIN;
    }
    if (job->op != BATCH_Z && job->op != BATCH_FLOW_TO_REFERENCE) {
        job->m_status = gk__fluid_molar_mass(&job->fluid, &job->m);
    }
    if (job->op == BATCH_DENSITY) { return job->m_status; }
    if (uses_ref) {
        job->z_ref_status = gk__fluid_gas_z(&job->fluid, job->ref.p, job->ref.t, &job->z_ref);
    }
    return GK_OK;
}

/* Opens the fluid and checks the arrays and what the elements share. True when the elements
   are to be run; false when there are none or all fail (then written here with the status of
   the first check that failed). The elements run in run_roots() or run_amounts(), called by
   the public function itself: neither loop's frame lies under the other's callees. */
static bool batch_open(batch_job *job, gk_eos eos, const gk_fluid *fluid, size_t count) {
    gk_status s = GK_OK;
    const bool needs_x = job->op != BATCH_DENSITY && job->op != BATCH_Z;
    if (count == 0u) { return false; }
    if (job->p == NULL || job->t == NULL || job->out[0] == NULL || (needs_x && job->x == NULL)) {
        s = GK_ERR_ARGUMENT;
    }
    if (s == GK_OK) {
        s = gk__fluid_init(&job->fluid, eos, fluid->gas, fluid->mixture, fluid->kij);
    }
    if (s == GK_OK) { s = batch_shared(job); }
    if (s != GK_OK) {
        (void)fail_all(count, s, job->out[0], job->out[1], job->out[2], job->status);
        return false;
    }
    return true;
}

/* A job with the given operation, inputs (x may be NULL) and first output; no reference
   condition, no further outputs. */
static void batch_job_init(batch_job *job, batch_op op, const gk_real *x, const gk_real *p,
                           const gk_real *t, gk_real *out, gk_status *status) {
    job->op = op;
    job->ref.p.pa = GK_LIT(0.0);
    job->ref.t.k = GK_LIT(0.0);
    job->m = GK_LIT(0.0);
    job->z_ref = GK_LIT(1.0);
    job->m_status = GK_OK;
    job->z_ref_status = GK_OK;
    job->x = x;
    job->p = p;
    job->t = t;
    job->out[0] = out;
    job->out[1] = NULL;
    job->out[2] = NULL;
    job->status = status;
}

size_t gk_fluid_density_batch(gk_eos eos, gk_fluid fluid, size_t count, const gk_real *p_pa,
                              const gk_real *t_k, gk_real *out_kg_per_m3, gk_status *status_out) {
    batch_job job;
    batch_job_init(&job, BATCH_DENSITY, NULL, p_pa, t_k, out_kg_per_m3, status_out);
    if (!batch_open(&job, eos, &fluid, count)) { return 0; }
    return run_roots(&job, count);
}

size_t gk_eos_density_batch(gk_eos eos, const gk_gas *gas, size_t count, const gk_real *p_pa,
                            const gk_real *t_k, gk_real *out_kg_per_m3, gk_status *status_out) {
    batch_job job;
    gk_fluid fluid;
    fluid.gas = gas;
    fluid.mixture = NULL;
    fluid.kij = NULL;
    batch_job_init(&job, BATCH_DENSITY, NULL, p_pa, t_k, out_kg_per_m3, status_out);
    if (!batch_open(&job, eos, &fluid, count)) { return 0; }
    return run_roots(&job, count);
}

size_t gk_fluid_z_batch(gk_eos eos, gk_fluid fluid, size_t count, const gk_real *p_pa,
                        const gk_real *t_k, gk_real *out_z, gk_status *status_out) {
    batch_job job;
    batch_job_init(&job, BATCH_Z, NULL, p_pa, t_k, out_z, status_out);
    if (!batch_open(&job, eos, &fluid, count)) { return 0; }
    return run_roots(&job, count);
}

size_t gk_vessel_contents_batch(gk_eos eos, gk_fluid fluid, gk_reference ref, size_t count,
                                const gk_real *v_m3, const gk_real *p_pa, const gk_real *t_k,
                                gk_real *out_mol, gk_real *out_kg, gk_real *out_reference_m3,
                                gk_status *status_out) {
    batch_job job;
    batch_job_init(&job, BATCH_CONTENTS, v_m3, p_pa, t_k, out_mol, status_out);
    job.ref = ref;
    job.out[1] = out_kg;
    job.out[2] = out_reference_m3;
    if (!batch_open(&job, eos, &fluid, count)) { return 0; }
    return run_amounts(&job, count);
}

size_t gk_flow_to_reference_batch(gk_eos eos, gk_fluid fluid, gk_reference ref, size_t count,
                                  const gk_real *q_m3_per_s, const gk_real *p_pa,
                                  const gk_real *t_k, gk_real *out_m3_per_s,
                                  gk_status *status_out) {
    batch_job job;
    batch_job_init(&job, BATCH_FLOW_TO_REFERENCE, q_m3_per_s, p_pa, t_k, out_m3_per_s, status_out);
    job.ref = ref;
    if (!batch_open(&job, eos, &fluid, count)) { return 0; }
    return run_amounts(&job, count);
}

size_t gk_flow_to_mass_batch(gk_eos eos, gk_fluid fluid, size_t count, const gk_real *q_m3_per_s,
                             const gk_real *p_pa, const gk_real *t_k, gk_real *out_kg_per_s,
                             gk_status *status_out) {
    batch_job job;
    batch_job_init(&job, BATCH_FLOW_TO_MASS, q_m3_per_s, p_pa, t_k, out_kg_per_s, status_out);
    if (!batch_open(&job, eos, &fluid, count)) { return 0; }
    return run_amounts(&job, count);
}
