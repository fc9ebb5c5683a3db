/*
 * mixture.c - composition text, normalization, mean molar mass, and the shared composition
 * check (mixture_internal.h). The mixture equation of state lives in its own module.
 */
#include "mixture_internal.h"
#include "number_parse.h"

/* Longest composition text accepted, in characters before the NUL (documented in mixture.h).
   Sixteen components with long names and numbers fit comfortably. */
#define GK__MIXTURE_TEXT_MAX 1024
/* Longest gas name or formula passed on to gk_gas_find(); a longer one names no gas. */
#define GK__MIXTURE_NAME_MAX 63

/* Sum with Neumaier's compensation (A. Neumaier, ZAMM 54 (1974) 39; common practice): the
   error stays about one rounding of the result instead of growing with the count, so 16
   float fractions keep well inside the 1e-6 budget. */
static gk_real gk__compensated_sum(const gk_real *x, size_t n) {
    gk_real s = GK_LIT(0.0);
    gk_real c = GK_LIT(0.0);
    size_t i;
    for (i = 0; i < n; ++i) {
        gk_real t = s + x[i];
        if (gk_fabs(s) >= gk_fabs(x[i])) {
            c += (s - t) + x[i];
        } else {
            c += (x[i] - t) + s;
        }
        s = t;
    }
    return s + c;
}

gk_status gk__mixture_check(const gk_mixture *mix) {
    size_t i;
    gk_real sum;

    if (mix == NULL) return GK_ERR_ARGUMENT;
    if (mix->count == 0u || mix->count > GK_MIXTURE_MAX) return GK_ERR_COMPOSITION;
    for (i = 0; i < mix->count; ++i) {
        if (mix->gas[i] == NULL) return GK_ERR_ARGUMENT;
    }
    for (i = 0; i < mix->count; ++i) {
        gk_real x = mix->mole_fraction[i];
        /* written so that NaN fails too */
        if (!(x >= GK_LIT(0.0) && x <= GK_LIT(1.0))) return GK_ERR_COMPOSITION;
    }
    sum = gk__compensated_sum(mix->mole_fraction, mix->count);
    if (!(gk_fabs(sum - GK_LIT(1.0)) <= GK__MIXTURE_SUM_TOL)) return GK_ERR_COMPOSITION;
    for (i = 0; i < mix->count; ++i) {
        if (!gk_positive(mix->gas[i]->molar_mass.kg_per_mol)) return GK_ERR_DOMAIN;
    }
    return GK_OK;
}

/* ------------------------------------------------------------------ text */

static int gk__is_space(char c) {
    return (c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\v' || c == '\f') ? 1 : 0;
}

static char gk__lower(char c) {
    return (c >= 'A' && c <= 'Z') ? (char)(c - 'A' + 'a') : c;
}

/* Does text[pos .. len) start with the lower-case word w, without regard to ASCII case? */
static int gk__starts_with_ci(const char *text, size_t pos, size_t len, const char *w) {
    while (*w != '\0') {
        if (pos >= len || gk__lower(text[pos]) != *w) return 0;
        ++pos;
        ++w;
    }
    return 1;
}

static size_t gk__skip_spaces(const char *text, size_t pos, size_t len) {
    while (pos < len && gk__is_space(text[pos])) ++pos;
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
gk_status gk_mixture_parse(const char *text, gk_mixture *out) {
    gk_mixture mix;
    size_t len = 0;
    size_t pos = 0;
    size_t i;
    size_t balance_index = GK_MIXTURE_MAX;   /* none yet */
    gk_real sum;

    if (text == NULL || out == NULL) return GK_ERR_ARGUMENT;
    /* Bounded length: reads at most GK__MIXTURE_TEXT_MAX + 1 characters, never past the NUL. */
    while (len <= GK__MIXTURE_TEXT_MAX && text[len] != '\0') ++len;
    if (len > GK__MIXTURE_TEXT_MAX) return GK_ERR_PARSE;

    mix.count = 0;
    for (i = 0; i < GK_MIXTURE_MAX; ++i) {
        mix.gas[i] = NULL;
        mix.mole_fraction[i] = GK_LIT(0.0);
    }

    for (;;) {
        size_t eq = pos;
        size_t name_begin;
        size_t name_end;
        size_t v;
        int is_balance = 0;
        gk__decimal number = {0u, 0, 0};
        int32_t scale_exp10 = 0;
        char name[GK__MIXTURE_NAME_MAX + 1];
        const gk_gas *gas = NULL;
        gk_status st;

        /* name */
        while (eq < len && text[eq] != '=') ++eq;
        if (eq == len) return GK_ERR_PARSE;                 /* no '=': "", "N2", "N2=1," */
        name_begin = gk__skip_spaces(text, pos, eq);
        name_end = eq;
        while (name_end > name_begin && gk__is_space(text[name_end - 1])) --name_end;
        if (name_end == name_begin) return GK_ERR_PARSE;     /* "=0.5" */
        if (text[name_begin] == ',' || text[name_end - 1] == ',') return GK_ERR_PARSE;

        /* value */
        v = gk__skip_spaces(text, eq + 1, len);
        if (gk__starts_with_ci(text, v, len, "balance")) {
            is_balance = 1;
            v += 7u;
        } else {
            size_t used = 0;
            st = gk__decimal_scan(text + v, len - v, &number, &used);
            if (st != GK_OK) return GK_ERR_PARSE;            /* "N2=", "N2=abc" */
            v = gk__skip_spaces(text, v + used, len);
            if (v < len && text[v] == '%') {
                scale_exp10 = -2;
                v += 1u;
            } else if (gk__starts_with_ci(text, v, len, "ppm")) {
                scale_exp10 = -6;
                v += 3u;
            }
        }
        v = gk__skip_spaces(text, v, len);
        if (v < len && text[v] != ',') return GK_ERR_PARSE;  /* "N2=0.5 O2=0.5", "N2=5%%" */

        /* gas */
        if (name_end - name_begin > GK__MIXTURE_NAME_MAX) return GK_ERR_NOT_FOUND;
        for (i = 0; i < name_end - name_begin; ++i) name[i] = text[name_begin + i];
        name[name_end - name_begin] = '\0';
        st = gk_gas_find(name, &gas);
        if (st == GK_ERR_NOT_FOUND) {
            /* "N2=0,5, O2=0,5": a comma inside a name that names no gas was most likely
               meant as a separator, so the text is malformed rather than the gas unknown. */
            for (i = 0; name[i] != '\0'; ++i) {
                if (name[i] == ',') return GK_ERR_PARSE;
            }
        }
        if (st != GK_OK) return st;

        if (mix.count == GK_MIXTURE_MAX) return GK_ERR_COMPOSITION;
        for (i = 0; i < mix.count; ++i) {
            if (mix.gas[i] == gas) return GK_ERR_COMPOSITION; /* listed twice */
        }

        if (is_balance) {
            if (balance_index != GK_MIXTURE_MAX) return GK_ERR_PARSE;  /* two balances */
            balance_index = mix.count;
        } else {
            gk_real x = GK_LIT(0.0);
            st = gk__decimal_to_real(number, scale_exp10, &x);
            if (st != GK_OK) return GK_ERR_COMPOSITION;      /* overflows: far above 1 */
            if (number.negative && number.mantissa != 0u) return GK_ERR_COMPOSITION;
            if (x > GK_LIT(1.0)) return GK_ERR_COMPOSITION;
            mix.mole_fraction[mix.count] = x;
        }
        mix.gas[mix.count] = gas;
        mix.count += 1u;

        if (v == len) break;
        pos = v + 1u;                                        /* past ',' */
    }

    /* the balance slot still holds 0, so this is the sum of the given fractions */
    sum = gk__compensated_sum(mix.mole_fraction, mix.count);
    if (balance_index != GK_MIXTURE_MAX) {
        gk_real rest = GK_LIT(1.0) - sum;
        if (rest < -GK__MIXTURE_SUM_TOL) return GK_ERR_COMPOSITION;  /* negative balance */
        if (rest < GK_LIT(0.0)) rest = GK_LIT(0.0);   /* rounding within the 1e-6 budget */
        mix.mole_fraction[balance_index] = rest;
    } else if (!(gk_fabs(sum - GK_LIT(1.0)) <= GK__MIXTURE_SUM_TOL)) {
        return GK_ERR_COMPOSITION;
    }
    *out = mix;
    return GK_OK;
}

/* ------------------------------------------------------------------ normalize, molar mass */

gk_status gk_mixture_normalize(gk_mixture *mix) {
    gk_real y[GK_MIXTURE_MAX];
    gk_real sum;
    gk_real largest = GK_LIT(0.0);
    size_t i;
    size_t n;

    if (mix == NULL) return GK_ERR_ARGUMENT;
    n = mix->count;
    if (n == 0u || n > GK_MIXTURE_MAX) return GK_ERR_COMPOSITION;
    for (i = 0; i < n; ++i) {
        if (mix->gas[i] == NULL) return GK_ERR_ARGUMENT;
    }
    for (i = 0; i < n; ++i) {
        gk_real x = mix->mole_fraction[i];
        if (!gk_finite(x) || x < GK_LIT(0.0)) return GK_ERR_COMPOSITION;
        if (x > largest) largest = x;
        y[i] = x;
    }
    if (!(largest > GK_LIT(0.0))) return GK_ERR_COMPOSITION;   /* all zero */

    sum = gk__compensated_sum(y, n);
    if (!gk_finite(sum)) {
        /* Huge proportions: bring them to [0, 1] first so the sum cannot overflow. */
        for (i = 0; i < n; ++i) y[i] /= largest;
        sum = gk__compensated_sum(y, n);
    }
    for (i = 0; i < n; ++i) {
        y[i] /= sum;                                   /* one rounding per fraction */
        if (y[i] > GK_LIT(1.0)) y[i] = GK_LIT(1.0);    /* guard an ulp above 1 */
    }
    for (i = 0; i < n; ++i) mix->mole_fraction[i] = y[i];
    return GK_OK;
}

gk_status gk_mixture_molar_mass(const gk_mixture *mix, gk_molar_mass *out) {
    gk_real terms[GK_MIXTURE_MAX];
    gk_real m;
    size_t i;
    gk_status st;

    if (mix == NULL || out == NULL) return GK_ERR_ARGUMENT;
    st = gk__mixture_check(mix);
    if (st != GK_OK) return st;
    for (i = 0; i < mix->count; ++i) {
        terms[i] = mix->mole_fraction[i] * mix->gas[i]->molar_mass.kg_per_mol;
    }
    m = gk__compensated_sum(terms, mix->count);
    if (!gk_positive(m)) return GK_ERR_RANGE;   /* overflow of absurd molar masses */
    out->kg_per_mol = m;
    return GK_OK;
}
