/*
 * mixture.c - composition text, normalization, mean molar mass, and the shared composition
 * check (mixture_internal.h). A mixture's equation of state goes through the fluid layer
 * (fluid.c) and the mixing rules of the model layer (eos.c).
 */
#include "mixture_internal.h"
#include "gas_internal.h"
#include "number_parse.h"

/* Longest composition text accepted, in characters before the NUL (documented in mixture.h).
   Sixteen components with long names and numbers fit comfortably. */
#define GK__MIXTURE_TEXT_MAX 1024u

/* GK_MIXTURE_MAX as a size_t, the type of the counts it bounds. */
#define GK__MIX_MAX ((size_t)GK_MIXTURE_MAX)

/* Sum with Neumaier's compensation (A. Neumaier, ZAMM 54 (1974) 39; common practice): the
   error stays about one rounding of the result instead of growing with the count, so 16
   float fractions keep well inside the 1e-6 budget. */
static void gk__neumaier_add(gk_real *s, gk_real *c, gk_real x) {
    gk_real t = *s + x;
    if (gk_fabs(*s) >= gk_fabs(x)) {
        *c += (*s - t) + x;
    } else {
        *c += (x - t) + *s;
    }
    *s = t;
}

static gk_real gk__compensated_sum(const gk_real *x, size_t n) {
    gk_real s = GK_LIT(0.0);
    gk_real c = GK_LIT(0.0);
    size_t i;
    for (i = 0; i < n; ++i) { gk__neumaier_add(&s, &c, x[i]); }
    return s + c;
}

gk_real gk__mixture_molar_mass(const gk_mixture *mix) {
    gk_real s = GK_LIT(0.0);
    gk_real c = GK_LIT(0.0);
    size_t i;
    for (i = 0; i < mix->count; ++i) {
        gk__neumaier_add(&s, &c, mix->mole_fraction[i] * mix->gas[i]->molar_mass.kg_per_mol);
    }
    return s + c;
}

gk_status gk__mixture_check(const gk_mixture *mix) {
    size_t i;
    gk_real sum;

    if (mix == NULL) { return GK_ERR_ARGUMENT; }
    if ((mix->count == 0u) || (mix->count > GK__MIX_MAX)) { return GK_ERR_COMPOSITION; }
    for (i = 0; i < mix->count; ++i) {
        if (mix->gas[i] == NULL) { return GK_ERR_ARGUMENT; }
    }
    for (i = 0; i < mix->count; ++i) {
        gk_real x = mix->mole_fraction[i];
        /* written so that NaN fails too */
        if (!(x >= GK_LIT(0.0) && x <= GK_LIT(1.0))) { return GK_ERR_COMPOSITION; }
    }
    sum = gk__compensated_sum(mix->mole_fraction, mix->count);
    if (!(gk_fabs(sum - GK_LIT(1.0)) <= GK__MIXTURE_SUM_TOL)) { return GK_ERR_COMPOSITION; }
    for (i = 0; i < mix->count; ++i) {
        if (!gk_positive(mix->gas[i]->molar_mass.kg_per_mol)) { return GK_ERR_DOMAIN; }
    }
    return GK_OK;
}

/* ------------------------------------------------------------------ text */

static bool gk__is_space(char c) {
    return c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\v' || c == '\f';
}

/* Does text[pos .. len) start with the lower-case word w, without regard to ASCII case? */
static bool gk__starts_with_ci(const char *text, size_t pos, size_t len, const char *w) {
    while (*w != '\0') {
        if (pos >= len || gk__ascii_lower(text[pos]) != *w) { return false; }
        ++pos;
        ++w;
    }
    return true;
}

static size_t gk__skip_spaces(const char *text, size_t pos, size_t len) {
    while (pos < len && gk__is_space(text[pos])) { ++pos; }
    return pos;
}

/*
 * Grammar (one pass, left to right; the first error found is reported, the sum checks come
 * after the whole text):
 *   text      = component { ',' component }
 *   component = name '=' value
 *   name      = everything up to the next '=', spaces trimmed at both ends; must not be empty
 *               and must not begin or end with ',' (so names with commas inside, such as
 *               "1,1,1,2-tetrafluoroethane", work, while ",," is still an error). A name with
 *               a comma inside that names no gas is GK_ERR_PARSE, not GK_ERR_NOT_FOUND: the
 *               comma was most likely a separator ("N2=0,5, O2=0,5" with decimal commas).
 *   value     = number [ '%' | "ppm" ] | "balance"      (spaces allowed around each token;
 *               "ppm" and "balance" in any ASCII case)
 * A component ends at ',' or at the end of the text; anything else after the value is an error.
 */
/* One component of the text, as read by parse_item(). */
typedef struct mix_item {
    const gk_gas *gas;
    gk__decimal number;  /* the value, unless is_balance */
    int32_t scale_exp10; /* -2 for '%', -6 for "ppm", else 0 */
    bool is_balance;
    size_t end; /* where the component ends: len or the index of its ',' */
} mix_item;

/* Reads the component that starts at text[pos] (syntax and gas; the value is converted by
   item_fraction()). Writes *it only on GK_OK. */
static gk_status parse_item(const char *text, size_t len, size_t pos, mix_item *it) {
    size_t eq = pos;
    size_t name_begin;
    size_t name_end;
    size_t v;
    size_t i;
    bool is_balance = false;
    gk__decimal number = { 0u, 0, 0 };
    int32_t scale_exp10 = 0;
    const gk_gas *gas = NULL;
    gk_status st;

    /* name */
    while (eq < len && text[eq] != '=') { ++eq; }
    if (eq == len) { return GK_ERR_PARSE; /* no '=': "", "N2", "N2=1," */ }
    name_begin = gk__skip_spaces(text, pos, eq);
    name_end = eq;
    while ((name_end > name_begin) && gk__is_space(text[name_end - 1u])) { --name_end; }
    if (name_end == name_begin) { return GK_ERR_PARSE; /* "=0.5" */ }
    if ((text[name_begin] == ',') || (text[name_end - 1u] == ',')) { return GK_ERR_PARSE; }

    /* value */
    v = gk__skip_spaces(text, eq + 1u, len);
    if (gk__starts_with_ci(text, v, len, "balance")) {
        is_balance = true;
        v += 7u;
    } else {
        size_t used = 0;
        st = gk__decimal_scan(&text[v], len - v, &number, &used);
        if (st != GK_OK) { return GK_ERR_PARSE; /* "N2=", "N2=abc" */ }
        v = gk__skip_spaces(text, v + used, len);
        if (v < len && text[v] == '%') {
            scale_exp10 = -2;
            v += 1u;
        } else if (gk__starts_with_ci(text, v, len, "ppm")) {
            scale_exp10 = -6;
            v += 3u;
        } else {
            /* a plain fraction */
        }
    }
    v = gk__skip_spaces(text, v, len);
    if (v < len && text[v] != ',') { return GK_ERR_PARSE; /* "N2=0.5 O2=0.5", "N2=5%%" */ }

    /* gas */
    st = gk__gas_find_n(&text[name_begin], name_end - name_begin, &gas);
    if (st == GK_ERR_NOT_FOUND) {
        /* "N2=0,5, O2=0,5": a comma inside a name that names no gas was most likely
           meant as a separator, so the text is malformed rather than the gas unknown. */
        for (i = name_begin; i < name_end; ++i) {
            if (text[i] == ',') { return GK_ERR_PARSE; }
        }
    }
    if (st != GK_OK) { return st; }
    it->gas = gas;
    it->number = number;
    it->scale_exp10 = scale_exp10;
    it->is_balance = is_balance;
    it->end = v;
    return GK_OK;
}

/* The mole fraction of a component that is not the balance. */
static gk_status item_fraction(const mix_item *it, gk_real *x) {
    gk_real y = GK_LIT(0.0);
    if (gk__decimal_to_real(it->number, it->scale_exp10, &y) != GK_OK) {
        return GK_ERR_COMPOSITION; /* overflows: far above 1 */
    }
    if (it->number.negative && it->number.mantissa != 0u) { return GK_ERR_COMPOSITION; }
    if (y > GK_LIT(1.0)) { return GK_ERR_COMPOSITION; }
    *x = y;
    return GK_OK;
}

/* What the first pass knows after each component. */
typedef struct mix_tally {
    size_t count;         /* components read */
    size_t balance_index; /* the "balance" component, or GK_MIXTURE_MAX for none yet */
    gk_real sum, comp;    /* Neumaier sum of the given fractions and its compensation */
} mix_tally;

/* Is gas among the first count components of the text (already read without error)? */
static bool listed_before(const char *text, size_t len, size_t count, const gk_gas *gas) {
    mix_item it = { NULL, { 0u, 0, 0 }, 0, false, 0u };
    size_t i, q = 0;
    for (i = 0; i < count; ++i) {
        it.gas = NULL;
        it.end = len;
        /* read without error before (check_text visits the same positions in the same order and
           parse_item depends on text, len and q only); a failure here would be a defect, and
           counting the gas as listed then makes the text GK_ERR_COMPOSITION, never a result */
        if ((parse_item(text, len, q, &it) != GK_OK) || (it.gas == gas)) { return true; }
        q = it.end + 1u;
    }
    return false;
}

/* The checks of one component read by parse_item(), in the order of mixture.h: room, a gas
   listed twice, two balances, then its value; adds the value to the tally. */
static gk_status tally_item(const char *text, size_t len, const mix_item *it, mix_tally *tally) {
    gk_real x = GK_LIT(0.0);
    gk_status value_st = GK_OK;
    if (tally->count == GK__MIX_MAX) { return GK_ERR_COMPOSITION; }
    if (!it->is_balance) { value_st = item_fraction(it, &x); }
    if (listed_before(text, len, tally->count, it->gas)) { return GK_ERR_COMPOSITION; }
    if (it->is_balance) {
        if (tally->balance_index != GK__MIX_MAX) { return GK_ERR_PARSE; /* two balances */ }
        tally->balance_index = tally->count;
    } else {
        if (value_st != GK_OK) { return value_st; }
        gk__neumaier_add(&tally->sum, &tally->comp, x);
    }
    tally->count += 1u;
    return GK_OK;
}

/* Pass 1: every check of the text, the first error from left to right, then the sum; *rest is
   the balance fraction (0 without a balance). */
static gk_status check_text(const char *text, size_t len, mix_tally *tally, gk_real *rest) {
    mix_item it = { NULL, { 0u, 0, 0 }, 0, false, 0u };
    size_t pos = 0;
    gk_real sum;
    gk_status st;
    for (;;) {
        st = parse_item(text, len, pos, &it);
        if (st == GK_OK) { st = tally_item(text, len, &it, tally); }
        if (st != GK_OK) { return st; }
        if (it.end == len) { break; }
        pos = it.end + 1u; /* past ',' */
    }
    sum = tally->sum + tally->comp;
    *rest = GK_LIT(0.0);
    if (tally->balance_index != GK__MIX_MAX) {
        gk_real r = GK_LIT(1.0) - sum;
        if (r < -GK__MIXTURE_SUM_TOL) { return GK_ERR_COMPOSITION; /* negative balance */ }
        if (r > GK_LIT(0.0)) { *rest = r; /* a rounding below 0 within the 1e-6 budget is 0 */ }
    } else if (!(gk_fabs(sum - GK_LIT(1.0)) <= GK__MIXTURE_SUM_TOL)) {
        return GK_ERR_COMPOSITION;
    } else {
        /* no balance, and the fractions sum to 1 */
    }
    return GK_OK;
}

/* Pass 2 over a checked text: the same components again, into *out. Its two calls cannot fail,
   by construction: parse_item and item_fraction are functions of their arguments only (no state),
   and check_text called them with the same arguments (positions 0, end + 1, ... of the same
   components in the same order) and stopped on the first status other than GK_OK; the
   statuses are therefore not checked again here (checking them would need a third way out with
   *out half written). */
static void write_mixture(const char *text, size_t len, const mix_tally *tally, gk_real rest,
                          gk_mixture *out) {
    mix_item it = { NULL, { 0u, 0, 0 }, 0, false, 0u };
    size_t i, pos = 0;
    for (i = 0; i < GK__MIX_MAX; ++i) {
        gk_real x = GK_LIT(0.0);
        const gk_gas *gas = NULL;
        if (i < tally->count) {
            it.gas = NULL;
            it.end = len;
            (void)parse_item(text, len, pos, &it);
            gas = it.gas;
            if (i == tally->balance_index) {
                x = rest;
            } else {
                (void)item_fraction(&it, &x);
            }
            pos = it.end + 1u;
        }
        out->gas[i] = gas;
        out->mole_fraction[i] = x;
    }
    out->count = tally->count;
}

/*
 * Two passes over the text, so that *out stays untouched on every error without a second
 * gk_mixture: the first makes every check and forms the sum (and the balance), the second reads
 * the same components again and writes them.
 */
gk_status gk_mixture_parse(const char *text, gk_mixture *out) {
    mix_tally tally = { 0u, GK__MIX_MAX, GK_LIT(0.0), GK_LIT(0.0) };
    size_t len = 0;
    gk_real rest = GK_LIT(0.0);
    gk_status st;

    if (text == NULL || out == NULL) { return GK_ERR_ARGUMENT; }
    /* Bounded length: reads at most GK__MIXTURE_TEXT_MAX + 1 characters, never past the NUL. */
    while ((len <= GK__MIXTURE_TEXT_MAX) && (text[len] != '\0')) { ++len; }
    if (len > GK__MIXTURE_TEXT_MAX) { return GK_ERR_PARSE; }
    st = check_text(text, len, &tally, &rest);
    if (st != GK_OK) { return st; }
    write_mixture(text, len, &tally, rest, out);
    return GK_OK;
}

/* ------------------------------------------------------------------ normalize, molar mass */

gk_status gk_mixture_normalize(gk_mixture *mix) {
    gk_real y[GK_MIXTURE_MAX];
    gk_real sum;
    gk_real largest = GK_LIT(0.0);
    size_t i;
    size_t n;

    if (mix == NULL) { return GK_ERR_ARGUMENT; }
    n = mix->count;
    if ((n == 0u) || (n > GK__MIX_MAX)) { return GK_ERR_COMPOSITION; }
    for (i = 0; i < n; ++i) {
        if (mix->gas[i] == NULL) { return GK_ERR_ARGUMENT; }
    }
    for (i = 0; i < n; ++i) {
        gk_real x = mix->mole_fraction[i];
        if (!gk_finite(x) || x < GK_LIT(0.0)) { return GK_ERR_COMPOSITION; }
        if (x > largest) { largest = x; }
        y[i] = x;
    }
    if (!(largest > GK_LIT(0.0))) { return GK_ERR_COMPOSITION; /* all zero */ }

    sum = gk__compensated_sum(y, n);
    if (!gk_finite(sum)) {
        /* Huge proportions: bring them to [0, 1] first so the sum cannot overflow. */
        for (i = 0; i < n; ++i) { y[i] /= largest; }
        sum = gk__compensated_sum(y, n);
    }
    for (i = 0; i < n; ++i) {
        y[i] /= sum; /* one rounding per fraction */
        if (y[i] > GK_LIT(1.0)) { y[i] = GK_LIT(1.0); /* guard an ulp above 1 */ }
    }
    for (i = 0; i < n; ++i) { mix->mole_fraction[i] = y[i]; }
    return GK_OK;
}

gk_status gk_mixture_molar_mass(const gk_mixture *mix, gk_molar_mass *out) {
    gk_real m;
    gk_status st;

    if (mix == NULL || out == NULL) { return GK_ERR_ARGUMENT; }
    st = gk__mixture_check(mix);
    if (st != GK_OK) { return st; }
    m = gk__mixture_molar_mass(mix);
    if (!gk_positive(m)) { return GK_ERR_RANGE; /* overflow of absurd molar masses */ }
    out->kg_per_mol = m;
    return GK_OK;
}
