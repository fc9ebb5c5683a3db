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
 * The fluid calls check the model and the fluid once per array, then give each element the
 * result and status of the scalar function (see batch.h).
 */
#include <stdbool.h>
#include <stdint.h>
#include "gk_scaled.h"
#include "eos_internal.h"

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
static GK_ALWAYS_INLINE bool ideal_block(size_t n, const gk_real *restrict p,
                                         const gk_real *restrict t, gk_real m, uint32_t key_lo,
                                         uint32_t span, gk_real *restrict out) {
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
        const gk_real *p = p_pa + base, *t = t_k + base;
        gk_real *out = out_kg_per_m3 + base;
        gk_status *st = (status_out != NULL) ? status_out + base : NULL;
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

/* What every element of one call shares. */
typedef struct batch_job {
    batch_op op;
    gk_eos eos;
    gk_fluid fluid;
    gk_reference ref;
    gk_molar_mass m; /* the mixture's molar mass (BATCH_DENSITY of a mixture only) */
} batch_job;

/* Density of a mixture at one state: M / Vm of the stable root. */
static gk_status mixture_density(const batch_job *job, gk_pressure p, gk_temperature t,
                                 gk_real *rho) {
    gk_eos_result r;
    gk_real d;
    const gk_status s = gk_mixture_eos_solve(job->eos, job->fluid.mixture, job->fluid.kij, p, t,
                                             GK_ROOT_STABLE, &r);
    if (s != GK_OK) { return s; }
    d = job->m.kg_per_mol / r.molar_volume.m3_per_mol;
    if (!gk_positive(d)) { return GK_ERR_RANGE; }
    *rho = d;
    return GK_OK;
}

/* One element: x is the element's volume or flow (unused by density and Z); r[0..2] receive
   the results on GK_OK. */
static gk_status batch_element(const batch_job *job, gk_real x, gk_pressure p, gk_temperature t,
                               gk_real r[3]) {
    gk_status s;
    switch (job->op) {
        case BATCH_DENSITY:
            if (job->fluid.gas != NULL) {
                gk_density rho = { GK_LIT(0.0) };
                s = gk_eos_density(job->eos, job->fluid.gas, p, t, &rho);
                r[0] = rho.kg_per_m3;
                return s;
            }
            return mixture_density(job, p, t, &r[0]);
        case BATCH_Z:
            return gk_fluid_z(job->eos, job->fluid, p, t, &r[0]);
        case BATCH_CONTENTS: {
            gk_contents c = { { GK_LIT(0.0) }, { GK_LIT(0.0) }, { GK_LIT(0.0) }, GK_LIT(0.0) };
            gk_volume v;
            v.m3 = x;
            s = gk_vessel_contents(job->eos, job->fluid, v, p, t, job->ref, &c);
            r[0] = c.amount.mol;
            r[1] = c.mass.kg;
            r[2] = c.reference_volume.m3;
            return s;
        }
        case BATCH_FLOW_TO_REFERENCE: {
            gk_volume_flow q, out = { GK_LIT(0.0) };
            q.m3_per_s = x;
            s = gk_flow_to_reference(job->eos, job->fluid, q, p, t, job->ref, &out);
            r[0] = out.m3_per_s;
            return s;
        }
        default: {
            gk_volume_flow q;
            gk_mass_flow w = { GK_LIT(0.0) };
            q.m3_per_s = x;
            s = gk_flow_to_mass(job->eos, job->fluid, q, p, t, &w);
            r[0] = w.kg_per_s;
            return s;
        }
    }
}

/* The element loop of every fluid call. x may be NULL for the calls without a volume or flow
   input; out2 and out3 may be NULL. Each element's inputs are read before its outputs are
   written, so an output may be an input array (in place). */
static size_t batch_run(const batch_job *job, size_t count, const gk_real *x, const gk_real *p_pa,
                        const gk_real *t_k, gk_real *out1, gk_real *out2, gk_real *out3,
                        gk_status *status_out) {
    size_t i, ok = 0;
    for (i = 0; i < count; ++i) {
        gk_real r[3] = { GK_LIT(0.0), GK_LIT(0.0), GK_LIT(0.0) };
        gk_pressure p;
        gk_temperature t;
        gk_status s;
        p.pa = p_pa[i];
        t.k = t_k[i];
        s = batch_element(job, (x != NULL) ? x[i] : GK_LIT(0.0), p, t, r);
        if (s != GK_OK) { r[0] = r[1] = r[2] = GK_BATCH_NAN; }
        out1[i] = r[0];
        if (out2 != NULL) { out2[i] = r[1]; }
        if (out3 != NULL) { out3[i] = r[2]; }
        if (status_out != NULL) { status_out[i] = s; }
        ok += (s == GK_OK) ? 1u : 0u;
    }
    return ok;
}

/* The whole-array checks of a fluid call: the model, exactly one of gas and mixture, and for
   the density of a mixture its molar mass (into job->m). */
static gk_status batch_prepare(batch_job *job) {
    if (!gk__eos_valid(job->eos)) { return GK_ERR_ARGUMENT; }
    if ((job->fluid.gas == NULL) == (job->fluid.mixture == NULL)) { return GK_ERR_ARGUMENT; }
    if (job->op == BATCH_DENSITY && job->fluid.mixture != NULL) {
        return gk_mixture_molar_mass(job->fluid.mixture, &job->m);
    }
    return GK_OK;
}

/* Checks the arrays and the job, then runs the elements (or fails them all). */
static size_t batch_call(batch_job *job, size_t count, const gk_real *x, bool needs_x,
                         const gk_real *p_pa, const gk_real *t_k, gk_real *out1, gk_real *out2,
                         gk_real *out3, gk_status *status_out) {
    gk_status s;
    if (count == 0u) { return 0; }
    if (p_pa == NULL || t_k == NULL || out1 == NULL || (needs_x && x == NULL)) {
        return fail_all(count, GK_ERR_ARGUMENT, out1, out2, out3, status_out);
    }
    s = batch_prepare(job);
    if (s != GK_OK) { return fail_all(count, s, out1, out2, out3, status_out); }
    return batch_run(job, count, needs_x ? x : NULL, p_pa, t_k, out1, out2, out3, status_out);
}

/* A job with the given operation, model, fluid and reference condition. */
static batch_job batch_job_make(batch_op op, gk_eos eos, gk_fluid fluid, gk_reference ref) {
    batch_job job;
    job.op = op;
    job.eos = eos;
    job.fluid = fluid;
    job.ref = ref;
    job.m.kg_per_mol = GK_LIT(0.0);
    return job;
}

/* The reference condition of the calls that have none (never read). */
static gk_reference no_reference(void) {
    gk_reference ref;
    ref.p.pa = GK_LIT(0.0);
    ref.t.k = GK_LIT(0.0);
    return ref;
}

size_t gk_fluid_density_batch(gk_eos eos, gk_fluid fluid, size_t count, const gk_real *p_pa,
                              const gk_real *t_k, gk_real *out_kg_per_m3, gk_status *status_out) {
    batch_job job = batch_job_make(BATCH_DENSITY, eos, fluid, no_reference());
    return batch_call(&job, count, NULL, false, p_pa, t_k, out_kg_per_m3, NULL, NULL, status_out);
}

size_t gk_eos_density_batch(gk_eos eos, const gk_gas *gas, size_t count, const gk_real *p_pa,
                            const gk_real *t_k, gk_real *out_kg_per_m3, gk_status *status_out) {
    gk_fluid fluid;
    fluid.gas = gas;
    fluid.mixture = NULL;
    fluid.kij = NULL;
    return gk_fluid_density_batch(eos, fluid, count, p_pa, t_k, out_kg_per_m3, status_out);
}

size_t gk_fluid_z_batch(gk_eos eos, gk_fluid fluid, size_t count, const gk_real *p_pa,
                        const gk_real *t_k, gk_real *out_z, gk_status *status_out) {
    batch_job job = batch_job_make(BATCH_Z, eos, fluid, no_reference());
    return batch_call(&job, count, NULL, false, p_pa, t_k, out_z, NULL, NULL, status_out);
}

size_t gk_vessel_contents_batch(gk_eos eos, gk_fluid fluid, gk_reference ref, size_t count,
                                const gk_real *v_m3, const gk_real *p_pa, const gk_real *t_k,
                                gk_real *out_mol, gk_real *out_kg, gk_real *out_reference_m3,
                                gk_status *status_out) {
    batch_job job = batch_job_make(BATCH_CONTENTS, eos, fluid, ref);
    return batch_call(&job, count, v_m3, true, p_pa, t_k, out_mol, out_kg, out_reference_m3,
                      status_out);
}

size_t gk_flow_to_reference_batch(gk_eos eos, gk_fluid fluid, gk_reference ref, size_t count,
                                  const gk_real *q_m3_per_s, const gk_real *p_pa,
                                  const gk_real *t_k, gk_real *out_m3_per_s,
                                  gk_status *status_out) {
    batch_job job = batch_job_make(BATCH_FLOW_TO_REFERENCE, eos, fluid, ref);
    return batch_call(&job, count, q_m3_per_s, true, p_pa, t_k, out_m3_per_s, NULL, NULL,
                      status_out);
}

size_t gk_flow_to_mass_batch(gk_eos eos, gk_fluid fluid, size_t count, const gk_real *q_m3_per_s,
                             const gk_real *p_pa, const gk_real *t_k, gk_real *out_kg_per_s,
                             gk_status *status_out) {
    batch_job job = batch_job_make(BATCH_FLOW_TO_MASS, eos, fluid, no_reference());
    return batch_call(&job, count, q_m3_per_s, true, p_pa, t_k, out_kg_per_s, NULL, NULL,
                      status_out);
}
