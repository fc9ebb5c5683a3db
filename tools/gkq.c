/*
 * gkq - gaskit query: the command-line face of gaskit, for bench checks and shell pipelines.
 *
 * Built on the public API only (gaskit/gaskit.h). Unlike the library it may use stdio and
 * strtod; it must still never crash on any input: every text is read with a bound, every
 * argument is checked before use, and every library status is reported by name.
 *
 *   gkq [options] WORD [ARGUMENTS...]        see usage() below, and docs/guide.md
 *
 * Arguments are quantities written with their unit ("2.5bar", "25degC", "3.2psi_g" for a
 * gauge reading, "40L", "15min", "60%") or words (a gas "N2", a mixture "CO2=5%;N2=balance",
 * a unit). A word takes its quantities by dimension, in the order given, so "200bar 15degC"
 * and "15degC 200bar" mean the same.
 *
 * Exit status: 0 success; 1 a calculation or an input failed (status name on stderr; in batch
 * mode: at least one row failed, all rows still written); 2 the command line itself is wrong.
 */
#include <ctype.h>
#include <errno.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "gaskit/gaskit.h"

#define GKQ_LINE_MAX 1024 /* longest batch line (bytes, without the newline) */
#define GKQ_CELLS_MAX 12  /* most cells in a batch row / arguments of a word */
#define GKQ_TEXT_MAX 256  /* longest fluid or unit text kept */
#define GKQ_FIELDS_MAX 24 /* most fields in one output record */

/* ------------------------------------------------------------------ small helpers */

static gk_real R(double x) { return (gk_real)x; }
static double D(gk_real x) { return (double)x; }

/* Copies at most cap-1 bytes and always terminates. */
static void copy_text(char *dst, size_t cap, const char *src) {
    size_t i = 0;
    if (cap == 0) { return; }
    while (src[i] != '\0' && i + 1 < cap) {
        dst[i] = src[i];
        i++;
    }
    dst[i] = '\0';
}

/* Short machine name of a status, for the batch status column. */
static const char *status_token(gk_status st) {
    switch (st) {
        case GK_OK:
            return "ok";
        case GK_ERR_ARGUMENT:
            return "argument";
        case GK_ERR_DOMAIN:
            return "domain";
        case GK_ERR_NO_SOLUTION:
            return "no_solution";
        case GK_ERR_RANGE:
            return "range";
        case GK_ERR_NOT_FOUND:
            return "not_found";
        case GK_ERR_COMPOSITION:
            return "composition";
        case GK_ERR_PARSE:
            return "parse";
        default:
            return "unknown";
    }
}

/* ------------------------------------------------------------------ dimensions */

typedef enum dim {
    DIM_NONE,
    DIM_PRESSURE,
    DIM_TEMPERATURE,
    DIM_VOLUME,
    DIM_AMOUNT,
    DIM_MOLAR_MASS,
    DIM_MOLAR_VOLUME,
    DIM_DENSITY,
    DIM_SPEED,
    DIM_MASS,
    DIM_VOLUME_FLOW,
    DIM_MASS_FLOW,
    DIM_TIME,  /* tool-only: s, min, h */
    DIM_NUMBER /* a bare number or a percentage */
} dim;

static const char *dim_name(dim d) {
    static const char *const names[] = { "?",      "pressure",   "temperature",  "volume",
                                         "amount", "molar mass", "molar volume", "density",
                                         "speed",  "mass",       "volume flow",  "mass flow",
                                         "time",   "number" };
    return ((size_t)d < sizeof names / sizeof names[0]) ? names[d] : "?";
}

/* The dimension of a gaskit unit (the enum is ordered by dimension in units.h). */
static dim unit_dim(gk_unit u) {
    if (u <= GK_UNIT_PSI) { return DIM_PRESSURE; }
    if (u <= GK_UNIT_DEGR) { return DIM_TEMPERATURE; }
    if (u <= GK_UNIT_GAL_US) { return DIM_VOLUME; }
    if (u <= GK_UNIT_LBMOL) { return DIM_AMOUNT; }
    if (u <= GK_UNIT_G_PER_MOL) { return DIM_MOLAR_MASS; }
    if (u <= GK_UNIT_CM3_PER_MOL) { return DIM_MOLAR_VOLUME; }
    if (u <= GK_UNIT_LB_PER_FT3) { return DIM_DENSITY; }
    if (u <= GK_UNIT_FT_PER_S) { return DIM_SPEED; }
    if (u <= GK_UNIT_LB) { return DIM_MASS; }
    if (u <= GK_UNIT_FT3_PER_MIN) { return DIM_VOLUME_FLOW; }
    if (u < GK_UNIT_COUNT) { return DIM_MASS_FLOW; }
    return DIM_NONE;
}

/* ------------------------------------------------------------------ quantities */

/* A quantity as written: "2.5bar", "3.2psi_g", "25degC", "15min", "60%", "0.8". */
typedef struct quantity {
    double value; /* the number as written (a percentage already divided by 100) */
    dim d;
    gk_unit unit;     /* for gaskit dimensions */
    int gauge;        /* pressure with the gauge mark "_g" */
    const char *text; /* the argument as given */
} quantity;

/* Where an error came from, for the message on stderr or in the batch row. */
typedef struct detail {
    char text[GKQ_TEXT_MAX];
} detail;

static void say(detail *why, const char *what, const char *arg) {
    snprintf(why->text, sizeof why->text, "%s '%.120s'", what, arg);
}

static int looks_like_quantity(const char *s) {
    unsigned char c = (unsigned char)s[0];
    return isdigit(c) || c == '+' || c == '-' || c == '.';
}

/* Parses a quantity. Text after the number (spaces allowed between) is the unit; the suffix
   "_g" on a pressure unit marks a gauge reading. */
static gk_status parse_quantity(const char *s, quantity *q, detail *why) {
    char unit[40];
    char *end = NULL;
    size_t n;
    double v;
    quantity out;
    gk_status st;

    memset(&out, 0, sizeof out);
    out.text = s;
    errno = 0;
    v = strtod(s, &end);
    if (end == s) {
        say(why, "not a number", s);
        return GK_ERR_PARSE;
    }
    if (!isfinite(v) || errno == ERANGE) {
        say(why, "number not finite", s);
        return GK_ERR_DOMAIN;
    }
    while (*end == ' ' || *end == '\t') { end++; }
    n = strlen(end);
    while (n > 0 && (end[n - 1] == ' ' || end[n - 1] == '\t')) { n--; }
    if (n >= sizeof unit) {
        say(why, "unit text too long in", s);
        return GK_ERR_PARSE;
    }
    memcpy(unit, end, n);
    unit[n] = '\0';

    if (isdigit((unsigned char)unit[0]) || unit[0] == '.' || unit[0] == '+' || unit[0] == '-') {
        say(why, "malformed number", s);
        return GK_ERR_PARSE;
    }
    if (n >= 2 && unit[n - 2] == '_' && (unit[n - 1] == 'g' || unit[n - 1] == 'a')) {
        out.gauge = unit[n - 1] == 'g';
        unit[n - 2] = '\0';
        if (unit[0] == '\0') {
            say(why, "gauge mark without a unit in", s);
            return GK_ERR_PARSE;
        }
        st = gk_unit_parse(unit, &out.unit);
        if (st != GK_OK) {
            say(why, "unknown unit in", s);
            return st;
        }
        if (unit_dim(out.unit) != DIM_PRESSURE) {
            say(why, "gauge mark on a unit that is not a pressure in", s);
            return GK_ERR_ARGUMENT;
        }
        out.d = DIM_PRESSURE;
    } else if (unit[0] == '\0') {
        out.d = DIM_NUMBER;
    } else if (strcmp(unit, "%") == 0) {
        out.d = DIM_NUMBER;
        v /= 100.0;
    } else if (strcmp(unit, "s") == 0) {
        out.d = DIM_TIME;
    } else if (strcmp(unit, "min") == 0) {
        out.d = DIM_TIME;
        v *= 60.0;
    } else if (strcmp(unit, "h") == 0) {
        out.d = DIM_TIME;
        v *= 3600.0;
    } else {
        st = gk_unit_parse(unit, &out.unit);
        if (st != GK_OK) {
            say(why, "unknown unit in", s);
            return st;
        }
        out.d = unit_dim(out.unit);
    }
    out.value = v;
    *q = out;
    return GK_OK;
}

/* ------------------------------------------------------------------ settings */

typedef enum out_format {
    OUT_TEXT,
    OUT_KV,
    OUT_JSON,
    OUT_CSV
} out_format;

typedef struct settings {
    gk_eos model;
    gk_root root;
    gk_pressure ambient; /* for gauge readings */
    gk_reference ref;
    char ref_name[48];
    out_format format;
    gk_unit show[GK_UNIT_COUNT]; /* display-unit overrides, in the order given */
    size_t show_count;
} settings;

static const char *model_name(gk_eos e) {
    switch (e) {
        case GK_EOS_IDEAL:
            return "ideal";
        case GK_EOS_VAN_DER_WAALS:
            return "vdw";
        case GK_EOS_REDLICH_KWONG:
            return "rk";
        case GK_EOS_SOAVE_REDLICH_KWONG:
            return "srk";
        case GK_EOS_PENG_ROBINSON:
            return "pr";
        default:
            return "?";
    }
}

static const char *model_title(gk_eos e) {
    switch (e) {
        case GK_EOS_IDEAL:
            return "ideal gas";
        case GK_EOS_VAN_DER_WAALS:
            return "van der Waals";
        case GK_EOS_REDLICH_KWONG:
            return "Redlich-Kwong";
        case GK_EOS_SOAVE_REDLICH_KWONG:
            return "Soave-Redlich-Kwong";
        case GK_EOS_PENG_ROBINSON:
            return "Peng-Robinson";
        default:
            return "?";
    }
}

static int parse_model(const char *s, gk_eos *out) {
    static const gk_eos all[] = { GK_EOS_IDEAL, GK_EOS_VAN_DER_WAALS, GK_EOS_REDLICH_KWONG,
                                  GK_EOS_SOAVE_REDLICH_KWONG, GK_EOS_PENG_ROBINSON };
    size_t i;
    for (i = 0; i < sizeof all / sizeof all[0]; i++) {
        if (strcmp(s, model_name(all[i])) == 0) {
            *out = all[i];
            return 1;
        }
    }
    return 0;
}

static const char *root_name(gk_root r) {
    return r == GK_ROOT_GAS ? "gas" : r == GK_ROOT_LIQUID ? "liquid" : "stable";
}

static int parse_root(const char *s, gk_root *out) {
    if (strcmp(s, "stable") == 0) {
        *out = GK_ROOT_STABLE;
        return 1;
    }
    if (strcmp(s, "gas") == 0) {
        *out = GK_ROOT_GAS;
        return 1;
    }
    if (strcmp(s, "liquid") == 0) {
        *out = GK_ROOT_LIQUID;
        return 1;
    }
    return 0;
}

/* Named reference conditions of the tool, over gk_reference_get(). */
/* clang-format off */
static const struct { const char *name; gk_reference_id id; } ref_names[] = {
    {"0C", GK_REF_0C_101325PA},     {"0C-100kPa", GK_REF_0C_100KPA},
    {"15C", GK_REF_15C_101325PA},   {"20C", GK_REF_20C_101325PA},
    {"25C", GK_REF_25C_101325PA},   {"60F", GK_REF_60F_14696PSI},
};
/* clang-format on */

/* A pressure quantity to an absolute pressure (gauge readings over the barometer). */
static gk_status to_pressure(const quantity *q, gk_pressure ambient, gk_pressure *out,
                             detail *why) {
    gk_status st;
    if (q->gauge) {
        st = gk_pressure_from_gauge(R(q->value), q->unit, ambient, out);
    } else {
        st = gk_pressure_from(R(q->value), q->unit, out);
    }
    if (st != GK_OK) { say(why, "pressure", q->text); }
    return st;
}

static gk_status to_temperature(const quantity *q, gk_temperature *out, detail *why) {
    gk_status st = gk_temperature_from(R(q->value), q->unit, out);
    if (st != GK_OK) { say(why, "temperature", q->text); }
    return st;
}

/* "--ref NAME" or "--ref PRESSURE@TEMPERATURE". */
static gk_status parse_reference(const char *s, const settings *set, gk_reference *out,
                                 detail *why) {
    size_t i;
    const char *at = strchr(s, '@');
    if (at == NULL) {
        for (i = 0; i < sizeof ref_names / sizeof ref_names[0]; i++) {
            if (strcmp(s, ref_names[i].name) == 0) {
                return gk_reference_get(ref_names[i].id, out);
            }
        }
        say(why, "unknown reference condition", s);
        return GK_ERR_NOT_FOUND;
    } else {
        char left[64];
        size_t n = (size_t)(at - s);
        quantity qp, qt;
        gk_reference r;
        gk_status st;
        if (n >= sizeof left) {
            say(why, "reference text too long", s);
            return GK_ERR_PARSE;
        }
        memcpy(left, s, n);
        left[n] = '\0';
        st = parse_quantity(left, &qp, why);
        if (st != GK_OK) { return st; }
        st = parse_quantity(at + 1, &qt, why);
        if (st != GK_OK) { return st; }
        if (qp.d != DIM_PRESSURE || qt.d != DIM_TEMPERATURE) {
            say(why, "reference must be PRESSURE@TEMPERATURE, not", s);
            return GK_ERR_ARGUMENT;
        }
        st = to_pressure(&qp, set->ambient, &r.p, why);
        if (st != GK_OK) { return st; }
        st = to_temperature(&qt, &r.t, why);
        if (st != GK_OK) { return st; }
        *out = r;
        return GK_OK;
    }
}

/* ------------------------------------------------------------------ output records */

typedef enum fkind {
    F_REAL,
    F_TEXT
} fkind;

/* One output field: its machine key, its label for people, and its unit. Real fields with a
   gaskit SI unit are stored in SI and shown in the default (or overridden) display unit;
   others carry a fixed unit text. */
typedef struct field {
    const char *key;
    const char *label;
    fkind kind;
    gk_unit si;        /* GK_UNIT_COUNT: no gaskit unit (see fixed) */
    gk_unit show;      /* default display unit */
    const char *fixed; /* unit text of a field without a gaskit unit ("" = none) */
} field;

typedef struct record {
    const field *f;
    size_t n;
    int set[GKQ_FIELDS_MAX];
    double v[GKQ_FIELDS_MAX];
    const char *s[GKQ_FIELDS_MAX];
    const char *fixed_override[GKQ_FIELDS_MAX];
} record;

static void rec_init(record *r, const field *f, size_t n) {
    memset(r, 0, sizeof *r);
    r->f = f;
    r->n = n < GKQ_FIELDS_MAX ? n : GKQ_FIELDS_MAX;
}

static size_t rec_index(const record *r, const char *key) {
    size_t i;
    for (i = 0; i < r->n; i++) {
        if (strcmp(r->f[i].key, key) == 0) { return i; }
    }
    return r->n;
}

static void rec_real(record *r, const char *key, double v) {
    size_t i = rec_index(r, key);
    if (i < r->n) {
        r->set[i] = 1;
        r->v[i] = v;
    }
}

static void rec_text(record *r, const char *key, const char *s) {
    size_t i = rec_index(r, key);
    if (i < r->n) {
        r->set[i] = 1;
        r->s[i] = s;
    }
}

/* The display unit of a field under the --units overrides (last matching override wins). */
static gk_unit display_unit(const settings *set, const field *f) {
    gk_unit u = f->show;
    size_t i;
    for (i = 0; i < set->show_count; i++) {
        gk_real tmp;
        if (gk_convert(R(1.0), f->si, set->show[i], &tmp) == GK_OK) { u = set->show[i]; }
    }
    return u;
}

static void print_json_string(FILE *out, const char *s) {
    fputc('"', out);
    for (; *s != '\0'; s++) {
        unsigned char c = (unsigned char)*s;
        if (c == '"' || c == '\\') {
            fprintf(out, "\\%c", c);
        } else if (c < 0x20) {
            fprintf(out, "\\u%04x", (unsigned)c);
        } else {
            fputc(c, out);
        }
    }
    fputc('"', out);
}

static void print_csv_text(FILE *out, const char *s) {
    if (strpbrk(s, ",\"\n\r") == NULL) {
        fputs(s, out);
        return;
    }
    fputc('"', out);
    for (; *s != '\0'; s++) {
        if (*s == '"') { fputc('"', out); }
        fputc(*s, out);
    }
    fputc('"', out);
}

/* Prints a record. Text: one "label  value unit" line per set field, values in display
   units. kv: "key=value" pairs on one line, SI values. JSON: one object per line, SI values.
   CSV (batch): the line number, status and every field in schema order (empty when unset). */
static void rec_print(FILE *out, const settings *set, const record *r, const char *word, long line,
                      gk_status st, const char *message) {
    size_t i;
    if (set->format == OUT_CSV) {
        fprintf(out, "%ld,%s,", line, status_token(st));
        print_csv_text(out, message);
        for (i = 0; i < r->n; i++) {
            fputc(',', out);
            if (!r->set[i]) { continue; }
            if (r->f[i].kind == F_TEXT) {
                print_csv_text(out, r->s[i]);
            } else {
                fprintf(out, "%.10g", r->v[i]);
            }
        }
        fputc('\n', out);
        return;
    }
    if (set->format == OUT_JSON) {
        fputc('{', out);
        fputs("\"word\":", out);
        print_json_string(out, word);
        for (i = 0; i < r->n; i++) {
            if (!r->set[i]) { continue; }
            fputc(',', out);
            print_json_string(out, r->f[i].key);
            fputc(':', out);
            if (r->f[i].kind == F_TEXT) {
                print_json_string(out, r->s[i]);
            } else {
                fprintf(out, "%.10g", r->v[i]);
            }
        }
        fputs("}\n", out);
        return;
    }
    if (set->format == OUT_KV) {
        fprintf(out, "word=%s", word);
        for (i = 0; i < r->n; i++) {
            if (!r->set[i]) { continue; }
            fprintf(out, " %s=", r->f[i].key);
            if (r->f[i].kind == F_TEXT) {
                /* kv values never hold spaces: they are replaced by '_' */
                const char *s;
                for (s = r->s[i]; *s != '\0'; s++) {
                    fputc((*s == ' ' || *s == '\t') ? '_' : *s, out);
                }
            } else {
                fprintf(out, "%.10g", r->v[i]);
            }
        }
        fputc('\n', out);
        return;
    }
    for (i = 0; i < r->n; i++) {
        const field *f = &r->f[i];
        if (!r->set[i]) { continue; }
        if (f->kind == F_TEXT) {
            fprintf(out, "  %-30s %s\n", f->label, r->s[i]);
        } else if (f->si != GK_UNIT_COUNT) {
            gk_unit u = display_unit(set, f);
            gk_real shown;
            if (gk_convert(R(r->v[i]), f->si, u, &shown) == GK_OK) {
                fprintf(out, "  %-30s %.6g %s\n", f->label, D(shown), gk_unit_symbol(u));
            } else {
                fprintf(out, "  %-30s %.6g %s\n", f->label, r->v[i], gk_unit_symbol(f->si));
            }
        } else {
            const char *unit = r->fixed_override[i] != NULL ? r->fixed_override[i] : f->fixed;
            fprintf(out, "  %-30s %.6g%s%s\n", f->label, r->v[i], unit[0] ? " " : "", unit);
        }
    }
    (void)line;
    (void)st;
    (void)message;
}

static void rec_csv_header(FILE *out, const record *r) {
    size_t i;
    fputs("line,status,message", out);
    for (i = 0; i < r->n; i++) { fprintf(out, ",%s", r->f[i].key); }
    fputc('\n', out);
}

/* ------------------------------------------------------------------ arguments of a word */

typedef struct args {
    size_t nq;
    quantity q[GKQ_CELLS_MAX];
    size_t nw;
    const char *w[GKQ_CELLS_MAX];
    int used_q[GKQ_CELLS_MAX];
} args;

static gk_status collect_args(int argc, char **argv, args *a, detail *why) {
    int i;
    gk_status st;
    memset(a, 0, sizeof *a);
    for (i = 0; i < argc; i++) {
        if (argv[i][0] == '\0') { continue; /* an empty CSV cell: an argument left out */ }
        if (looks_like_quantity(argv[i])) {
            if (a->nq >= GKQ_CELLS_MAX) {
                say(why, "too many quantities at", argv[i]);
                return GK_ERR_ARGUMENT;
            }
            st = parse_quantity(argv[i], &a->q[a->nq], why);
            if (st != GK_OK) { return st; }
            a->nq++;
        } else {
            if (a->nw >= GKQ_CELLS_MAX) {
                say(why, "too many words at", argv[i]);
                return GK_ERR_ARGUMENT;
            }
            a->w[a->nw++] = argv[i];
        }
    }
    return GK_OK;
}

/* The k-th (0-based) quantity of dimension d, or NULL; marks it used. */
static const quantity *take(args *a, dim d, size_t k) {
    size_t i, seen = 0;
    for (i = 0; i < a->nq; i++) {
        if (a->q[i].d == d) {
            if (seen == k) {
                a->used_q[i] = 1;
                return &a->q[i];
            }
            seen++;
        }
    }
    return NULL;
}

static gk_status need(args *a, dim d, size_t k, const char *what, const quantity **out,
                      detail *why) {
    const quantity *q = take(a, d, k);
    if (q == NULL) {
        size_t i;
        for (i = 0; i < a->nq; i++) {
            if (a->q[i].d == DIM_NUMBER && d != DIM_NUMBER) {
                snprintf(why->text, sizeof why->text, "missing %s: '%.60s' has no unit", what,
                         a->q[i].text);
                return GK_ERR_ARGUMENT;
            }
        }
        snprintf(why->text, sizeof why->text, "missing %s (a %s)", what, dim_name(d));
        return GK_ERR_ARGUMENT;
    }
    *out = q;
    return GK_OK;
}

/* Every quantity must have been taken and no more words than expected given. */
static gk_status all_used(const args *a, size_t words_expected, detail *why) {
    size_t i;
    for (i = 0; i < a->nq; i++) {
        if (!a->used_q[i]) {
            snprintf(why->text, sizeof why->text, "unexpected %s '%.100s'", dim_name(a->q[i].d),
                     a->q[i].text);
            return GK_ERR_ARGUMENT;
        }
    }
    if (a->nw > words_expected) {
        say(why, "unexpected word", a->w[words_expected]);
        return GK_ERR_ARGUMENT;
    }
    return GK_OK;
}

/* A fluid: a gas of the table ("N2", "carbon dioxide") or a mixture ("CO2=5%;N2=balance";
   ';' may stand for ',' so that the text needs no quoting in a shell or a CSV cell). */
typedef struct fluid_in {
    const gk_gas *gas;
    gk_mixture mix;
    int is_mix;
    gk_molar_mass m;
} fluid_in;

static gk_status parse_fluid(const char *text, fluid_in *f, detail *why) {
    gk_status st;
    memset(f, 0, sizeof *f);
    if (strchr(text, '=') != NULL) {
        char buf[GKQ_TEXT_MAX];
        size_t i;
        if (strlen(text) >= sizeof buf) {
            say(why, "mixture text too long", text);
            return GK_ERR_PARSE;
        }
        copy_text(buf, sizeof buf, text);
        for (i = 0; buf[i] != '\0'; i++) {
            if (buf[i] == ';') { buf[i] = ','; }
        }
        st = gk_mixture_parse(buf, &f->mix);
        if (st != GK_OK) {
            say(why, "mixture", text);
            return st;
        }
        st = gk_mixture_molar_mass(&f->mix, &f->m);
        if (st != GK_OK) {
            say(why, "mixture", text);
            return st;
        }
        f->is_mix = 1;
    } else {
        st = gk_gas_find(text, &f->gas);
        if (st != GK_OK) {
            say(why, "gas", text);
            return st;
        }
        f->m = f->gas->molar_mass;
    }
    return GK_OK;
}

static gk_fluid as_fluid(const fluid_in *f) {
    gk_fluid fl;
    fl.gas = f->is_mix ? NULL : f->gas;
    fl.mixture = f->is_mix ? &f->mix : NULL;
    fl.kij = NULL;
    return fl;
}

static gk_status need_word(const args *a, size_t k, const char *what, detail *why) {
    if (a->nw <= k) {
        snprintf(why->text, sizeof why->text, "missing %s", what);
        return GK_ERR_ARGUMENT;
    }
    return GK_OK;
}

#define U_NONE GK_UNIT_COUNT
#define CHECK(call, whattext, argtext) \
  do {                                 \
    gk_status st_ = (call);            \
    if (st_ != GK_OK) {                \
      say(why, (whattext), (argtext)); \
      return st_;                      \
    }                                  \
  } while (0)

/* ------------------------------------------------------------------ word: state */

/* clang-format off */
static const field state_fields[] = {
    {"fluid", "fluid", F_TEXT, U_NONE, U_NONE, ""},
    {"model", "model", F_TEXT, U_NONE, U_NONE, ""},
    {"root", "root asked", F_TEXT, U_NONE, U_NONE, ""},
    {"p", "pressure (absolute)", F_REAL, GK_UNIT_PA, GK_UNIT_BAR, ""},
    {"t", "temperature", F_REAL, GK_UNIT_K, GK_UNIT_DEGC, ""},
    {"molar_mass", "molar mass", F_REAL, GK_UNIT_KG_PER_MOL, GK_UNIT_G_PER_MOL, ""},
    {"z", "compressibility Z", F_REAL, U_NONE, U_NONE, ""},
    {"molar_volume", "molar volume", F_REAL, GK_UNIT_M3_PER_MOL, GK_UNIT_L_PER_MOL, ""},
    {"density", "density", F_REAL, GK_UNIT_KG_PER_M3, GK_UNIT_KG_PER_M3, ""},
    {"phi", "fugacity coefficient", F_REAL, U_NONE, U_NONE, ""},
    {"fugacity", "fugacity", F_REAL, GK_UNIT_PA, GK_UNIT_BAR, ""},
    {"branch", "branch returned", F_TEXT, U_NONE, U_NONE, ""},
    {"root_count", "real roots", F_REAL, U_NONE, U_NONE, ""},
    {"z_root_1", "Z root 1 (smallest)", F_REAL, U_NONE, U_NONE, ""},
    {"z_root_2", "Z root 2", F_REAL, U_NONE, U_NONE, ""},
    {"z_root_3", "Z root 3", F_REAL, U_NONE, U_NONE, ""},
    {"density_ideal", "density, ideal gas", F_REAL, GK_UNIT_KG_PER_M3, GK_UNIT_KG_PER_M3, ""},
    {"deviation", "real vs ideal density", F_REAL, U_NONE, U_NONE, "%"},
};
/* clang-format on */

static gk_status word_state(const settings *set, args *a, record *r, detail *why) {
    const quantity *qp, *qt;
    gk_pressure p;
    gk_temperature t;
    fluid_in f;
    gk_eos_result res;
    gk_density rho_i;
    gk_status st;
    double rho;
    int i;

    st = need_word(a, 0, "fluid (a gas or a mixture)", why);
    if (st != GK_OK) { return st; }
    if ((st = need(a, DIM_PRESSURE, 0, "pressure", &qp, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TEMPERATURE, 0, "temperature", &qt, why)) != GK_OK) { return st; }
    if ((st = all_used(a, 1, why)) != GK_OK) { return st; }
    if ((st = parse_fluid(a->w[0], &f, why)) != GK_OK) { return st; }
    if ((st = to_pressure(qp, set->ambient, &p, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt, &t, why)) != GK_OK) { return st; }
    if (f.is_mix) {
        CHECK(gk_mixture_eos_solve(set->model, &f.mix, NULL, p, t, set->root, &res), "state of",
              a->w[0]);
    } else {
        CHECK(gk_eos_solve(set->model, f.gas, p, t, set->root, &res), "state of", a->w[0]);
    }
    CHECK(gk_ideal_density(p, t, f.m, &rho_i), "ideal density of", a->w[0]);
    rho = D(f.m.kg_per_mol) / D(res.molar_volume.m3_per_mol);

    rec_text(r, "fluid", a->w[0]);
    rec_text(r, "model", model_name(set->model));
    rec_text(r, "root", root_name(set->root));
    rec_real(r, "p", D(p.pa));
    rec_real(r, "t", D(t.k));
    rec_real(r, "molar_mass", D(f.m.kg_per_mol));
    rec_real(r, "z", D(res.z));
    rec_real(r, "molar_volume", D(res.molar_volume.m3_per_mol));
    rec_real(r, "density", rho);
    rec_real(r, "phi", D(res.fugacity_coefficient));
    rec_real(r, "fugacity", D(res.fugacity_coefficient) * D(p.pa));
    rec_text(r, "branch",
             res.branch == GK_ROOT_LIQUID          ? "liquid"
             : res.branch == GK_ROOT_SUPERCRITICAL ? "supercritical"
                                                   : "gas");
    rec_real(r, "root_count", (double)res.root_count);
    for (i = 0; i < res.root_count && i < 3; i++) {
        static const char *const keys[3] = { "z_root_1", "z_root_2", "z_root_3" };
        rec_real(r, keys[i], D(res.z_roots[i]));
    }
    rec_real(r, "density_ideal", D(rho_i.kg_per_m3));
    rec_real(r, "deviation", 100.0 * (rho / D(rho_i.kg_per_m3) - 1.0));
    return GK_OK;
}

/* ------------------------------------------------------------------ word: convert */

/* clang-format off */
static const field convert_fields[] = {
    {"from", "from", F_TEXT, U_NONE, U_NONE, ""},
    {"value", "value", F_REAL, U_NONE, U_NONE, ""},
    {"unit", "unit", F_TEXT, U_NONE, U_NONE, ""},
};
/* clang-format on */

static gk_status word_convert(const settings *set, args *a, record *r, detail *why) {
    static char unit_text[48];
    quantity qto;
    const quantity *q;
    gk_real out;
    gk_status st;
    char probe[64];

    if (a->nq != 1) {
        snprintf(why->text, sizeof why->text, "convert takes one quantity and a unit");
        return GK_ERR_ARGUMENT;
    }
    if ((st = need_word(a, 0, "target unit", why)) != GK_OK) { return st; }
    a->used_q[0] = 1;
    if ((st = all_used(a, 1, why)) != GK_OK) { return st; }
    q = &a->q[0];
    if (q->d == DIM_TIME || q->d == DIM_NUMBER) {
        say(why, "convert works on gaskit units, not on", q->text);
        return GK_ERR_ARGUMENT;
    }
    /* the target unit is parsed as a quantity "1<unit>" to share the gauge mark */
    if (strlen(a->w[0]) + 2 > sizeof probe) {
        say(why, "unit text too long", a->w[0]);
        return GK_ERR_PARSE;
    }
    snprintf(probe, sizeof probe, "1%s", a->w[0]);
    if ((st = parse_quantity(probe, &qto, why)) != GK_OK) {
        say(why, "target unit", a->w[0]);
        return st;
    }
    if (qto.d != q->d) {
        snprintf(why->text, sizeof why->text, "cannot convert a %s to %.40s (a %s)", dim_name(q->d),
                 a->w[0], dim_name(qto.d));
        return GK_ERR_ARGUMENT;
    }
    if (q->d == DIM_PRESSURE && (q->gauge || qto.gauge)) {
        gk_pressure p;
        if ((st = to_pressure(q, set->ambient, &p, why)) != GK_OK) { return st; }
        if (qto.gauge) {
            CHECK(gk_convert(R(D(p.pa) - D(set->ambient.pa)), GK_UNIT_PA, qto.unit, &out),
                  "convert", q->text);
        } else {
            CHECK(gk_pressure_to(p, qto.unit, &out), "convert", q->text);
        }
    } else {
        CHECK(gk_convert(R(q->value), q->unit, qto.unit, &out), "convert", q->text);
    }
    copy_text(unit_text, sizeof unit_text, a->w[0]);
    rec_text(r, "from", q->text);
    rec_real(r, "value", D(out));
    r->fixed_override[1] = unit_text;
    rec_text(r, "unit", unit_text);
    return GK_OK;
}

/* ------------------------------------------------------------------ word: speeds */

/* clang-format off */
static const field speeds_fields[] = {
    {"fluid", "fluid", F_TEXT, U_NONE, U_NONE, ""},
    {"t", "temperature", F_REAL, GK_UNIT_K, GK_UNIT_DEGC, ""},
    {"molar_mass", "molar mass", F_REAL, GK_UNIT_KG_PER_MOL, GK_UNIT_G_PER_MOL, ""},
    {"most_probable", "most probable speed", F_REAL, GK_UNIT_M_PER_S, GK_UNIT_M_PER_S, ""},
    {"mean", "mean speed", F_REAL, GK_UNIT_M_PER_S, GK_UNIT_M_PER_S, ""},
    {"rms", "root-mean-square speed", F_REAL, GK_UNIT_M_PER_S, GK_UNIT_M_PER_S, ""},
    {"sound", "speed of sound (ideal gas)", F_REAL, GK_UNIT_M_PER_S, GK_UNIT_M_PER_S, ""},
    {"other", "compared with", F_TEXT, U_NONE, U_NONE, ""},
    {"effusion_ratio", "effusion rate ratio", F_REAL, U_NONE, U_NONE, ""},
    {"effusion_time_ratio", "effusion time ratio", F_REAL, U_NONE, U_NONE, ""},
    {"p", "pressure (absolute)", F_REAL, GK_UNIT_PA, GK_UNIT_KPA, ""},
    {"mean_free_path", "mean free path", F_REAL, U_NONE, U_NONE, "m"},
    {"wall_flux", "wall collision flux", F_REAL, U_NONE, U_NONE, "mol/(m2 s)"},
};
/* clang-format on */

static gk_status word_speeds(const settings *set, args *a, record *r, detail *why) {
    const quantity *qt, *qp;
    gk_temperature t;
    fluid_in f, g;
    gk_speed u;
    gk_status st;

    if ((st = need_word(a, 0, "fluid", why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TEMPERATURE, 0, "temperature", &qt, why)) != GK_OK) { return st; }
    qp = take(a, DIM_PRESSURE, 0);
    if ((st = all_used(a, 2, why)) != GK_OK) { return st; }
    if ((st = parse_fluid(a->w[0], &f, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt, &t, why)) != GK_OK) { return st; }
    rec_text(r, "fluid", a->w[0]);
    rec_real(r, "t", D(t.k));
    rec_real(r, "molar_mass", D(f.m.kg_per_mol));
    CHECK(gk_speed_most_probable(t, f.m, &u), "speed of", a->w[0]);
    rec_real(r, "most_probable", D(u.m_per_s));
    CHECK(gk_speed_mean(t, f.m, &u), "speed of", a->w[0]);
    rec_real(r, "mean", D(u.m_per_s));
    CHECK(gk_speed_rms(t, f.m, &u), "speed of", a->w[0]);
    rec_real(r, "rms", D(u.m_per_s));
    if (!f.is_mix && f.gas->heat_capacity_ratio > R(1.0)) {
        CHECK(gk_speed_of_sound_ideal(t, f.m, f.gas->heat_capacity_ratio, &u), "speed of sound in",
              a->w[0]);
        rec_real(r, "sound", D(u.m_per_s));
    }
    if (a->nw > 1) {
        gk_real ratio;
        if ((st = parse_fluid(a->w[1], &g, why)) != GK_OK) { return st; }
        CHECK(gk_effusion_ratio(f.m, g.m, &ratio), "effusion against", a->w[1]);
        rec_text(r, "other", a->w[1]);
        rec_real(r, "effusion_ratio", D(ratio));
        rec_real(r, "effusion_time_ratio", 1.0 / D(ratio));
    }
    if (qp != NULL) {
        gk_pressure p;
        gk_real flux;
        if ((st = to_pressure(qp, set->ambient, &p, why)) != GK_OK) { return st; }
        rec_real(r, "p", D(p.pa));
        CHECK(gk_wall_flux(p, t, f.m, &flux), "wall flux of", a->w[0]);
        rec_real(r, "wall_flux", D(flux));
        if (!f.is_mix && f.gas->collision_diameter > R(0.0)) {
            gk_real lambda;
            CHECK(gk_mean_free_path(p, t, f.gas->collision_diameter, &lambda), "mean free path of",
                  a->w[0]);
            rec_real(r, "mean_free_path", D(lambda));
        }
    }
    return GK_OK;
}

/* ------------------------------------------------------------------ word: water */

/* clang-format off */
static const field water_fields[] = {
    {"t", "saturation temperature", F_REAL, GK_UNIT_K, GK_UNIT_DEGC, ""},
    {"p_sat", "vapour pressure", F_REAL, GK_UNIT_PA, GK_UNIT_KPA, ""},
    {"phase", "over", F_TEXT, U_NONE, U_NONE, ""},
};
/* clang-format on */

static gk_status word_water(const settings *set, args *a, record *r, detail *why) {
    const quantity *q;
    gk_temperature t;
    gk_pressure p;
    gk_status st;
    if (a->nq != 1) {
        snprintf(why->text, sizeof why->text, "water takes one temperature or one pressure");
        return GK_ERR_ARGUMENT;
    }
    q = &a->q[0];
    a->used_q[0] = 1;
    if ((st = all_used(a, 0, why)) != GK_OK) { return st; }
    if (q->d == DIM_TEMPERATURE) {
        if ((st = to_temperature(q, &t, why)) != GK_OK) { return st; }
        CHECK(gk_water_vapour_pressure(t, &p), "vapour pressure at", q->text);
    } else if (q->d == DIM_PRESSURE) {
        if ((st = to_pressure(q, set->ambient, &p, why)) != GK_OK) { return st; }
        CHECK(gk_water_saturation_temperature(p, &t), "saturation temperature at", q->text);
    } else {
        say(why, "water takes a temperature or a pressure, not", q->text);
        return GK_ERR_ARGUMENT;
    }
    rec_real(r, "t", D(t.k));
    rec_real(r, "p_sat", D(p.pa));
    /* IAPWS: liquid water at and above the triple point 273.16 K (water.h) */
    rec_text(r, "phase", D(t.k) >= 273.16 ? "liquid water" : "ice");
    return GK_OK;
}

/* ------------------------------------------------------------------ word: dew */

/* clang-format off */
static const field dew_fields[] = {
    {"p", "total pressure (absolute)", F_REAL, GK_UNIT_PA, GK_UNIT_KPA, ""},
    {"t", "gas temperature", F_REAL, GK_UNIT_K, GK_UNIT_DEGC, ""},
    {"rh", "relative humidity", F_REAL, U_NONE, U_NONE, ""},
    {"p_water", "water partial pressure", F_REAL, GK_UNIT_PA, GK_UNIT_KPA, ""},
    {"x_water", "water mole fraction", F_REAL, U_NONE, U_NONE, ""},
    {"p_dry", "dry-gas partial pressure", F_REAL, GK_UNIT_PA, GK_UNIT_KPA, ""},
    {"dew_point", "dew (or frost) point", F_REAL, GK_UNIT_K, GK_UNIT_DEGC, ""},
};
/* clang-format on */

static gk_status word_dew(const settings *set, args *a, record *r, detail *why) {
    const quantity *qp, *qt, *qrh;
    gk_pressure p, pw, pdry;
    gk_temperature t, dew;
    gk_status st;

    if ((st = need(a, DIM_PRESSURE, 0, "pressure", &qp, why)) != GK_OK) { return st; }
    qt = take(a, DIM_TEMPERATURE, 0);
    qrh = take(a, DIM_NUMBER, 0);
    if ((st = all_used(a, 0, why)) != GK_OK) { return st; }
    if ((st = to_pressure(qp, set->ambient, &p, why)) != GK_OK) { return st; }
    if (qt == NULL && qrh == NULL) {
        /* the pressure is the water partial pressure */
        CHECK(gk_dew_point(p, &dew), "dew point at", qp->text);
        rec_real(r, "p_water", D(p.pa));
        rec_real(r, "dew_point", D(dew.k));
        return GK_OK;
    }
    if (qt == NULL || qrh == NULL) {
        snprintf(why->text, sizeof why->text,
                 "dew takes a water partial pressure, or a total pressure, a temperature and a "
                 "humidity");
        return GK_ERR_ARGUMENT;
    }
    if ((st = to_temperature(qt, &t, why)) != GK_OK) { return st; }
    CHECK(gk_dry_gas_pressure(p, t, R(qrh->value), &pdry), "wet gas at", qp->text);
    if (!(D(p.pa) - D(pdry.pa) > 0.0)) {
        /* completely dry gas: no dew point */
        rec_real(r, "p", D(p.pa));
        rec_real(r, "t", D(t.k));
        rec_real(r, "rh", qrh->value);
        rec_real(r, "p_water", 0.0);
        rec_real(r, "x_water", 0.0);
        rec_real(r, "p_dry", D(pdry.pa));
        return GK_OK;
    }
    pw.pa = R(D(p.pa) - D(pdry.pa));
    CHECK(gk_dew_point(pw, &dew), "dew point at", qp->text);
    rec_real(r, "p", D(p.pa));
    rec_real(r, "t", D(t.k));
    rec_real(r, "rh", qrh->value);
    rec_real(r, "p_water", D(pw.pa));
    rec_real(r, "x_water", D(pw.pa) / D(p.pa));
    rec_real(r, "p_dry", D(pdry.pa));
    rec_real(r, "dew_point", D(dew.k));
    return GK_OK;
}

/* ------------------------------------------------------------------ word: contents */

/* clang-format off */
static const field contents_fields[] = {
    {"fluid", "fluid", F_TEXT, U_NONE, U_NONE, ""},
    {"model", "model", F_TEXT, U_NONE, U_NONE, ""},
    {"reference", "reference condition", F_TEXT, U_NONE, U_NONE, ""},
    {"vessel", "vessel volume", F_REAL, GK_UNIT_M3, GK_UNIT_L, ""},
    {"p", "pressure (absolute)", F_REAL, GK_UNIT_PA, GK_UNIT_BAR, ""},
    {"t", "temperature", F_REAL, GK_UNIT_K, GK_UNIT_DEGC, ""},
    {"z", "compressibility Z", F_REAL, U_NONE, U_NONE, ""},
    {"amount", "amount", F_REAL, GK_UNIT_MOL, GK_UNIT_MOL, ""},
    {"mass", "mass", F_REAL, GK_UNIT_KG, GK_UNIT_KG, ""},
    {"reference_volume", "volume at reference", F_REAL, GK_UNIT_M3, GK_UNIT_L, ""},
    {"amount_ideal", "amount, ideal gas", F_REAL, GK_UNIT_MOL, GK_UNIT_MOL, ""},
    {"mass_ideal", "mass, ideal gas", F_REAL, GK_UNIT_KG, GK_UNIT_KG, ""},
    {"reference_volume_ideal", "volume at reference, ideal gas", F_REAL, GK_UNIT_M3, GK_UNIT_L, ""},
    {"deviation", "real vs ideal amount", F_REAL, U_NONE, U_NONE, "%"},
};
/* clang-format on */

static gk_status word_contents(const settings *set, args *a, record *r, detail *why) {
    const quantity *qv, *qp, *qt;
    gk_volume v;
    gk_pressure p;
    gk_temperature t;
    fluid_in f;
    gk_contents c, ci;
    gk_status st;

    if ((st = need_word(a, 0, "fluid", why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_VOLUME, 0, "vessel volume", &qv, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_PRESSURE, 0, "pressure", &qp, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TEMPERATURE, 0, "temperature", &qt, why)) != GK_OK) { return st; }
    if ((st = all_used(a, 1, why)) != GK_OK) { return st; }
    if ((st = parse_fluid(a->w[0], &f, why)) != GK_OK) { return st; }
    CHECK(gk_volume_from(R(qv->value), qv->unit, &v), "volume", qv->text);
    if ((st = to_pressure(qp, set->ambient, &p, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt, &t, why)) != GK_OK) { return st; }
    CHECK(gk_vessel_contents(set->model, as_fluid(&f), v, p, t, set->ref, &c), "contents of",
          a->w[0]);
    CHECK(gk_vessel_contents(GK_EOS_IDEAL, as_fluid(&f), v, p, t, set->ref, &ci),
          "ideal contents of", a->w[0]);
    rec_text(r, "fluid", a->w[0]);
    rec_text(r, "model", model_name(set->model));
    rec_text(r, "reference", set->ref_name);
    rec_real(r, "vessel", D(v.m3));
    rec_real(r, "p", D(p.pa));
    rec_real(r, "t", D(t.k));
    rec_real(r, "z", D(c.z));
    rec_real(r, "amount", D(c.amount.mol));
    rec_real(r, "mass", D(c.mass.kg));
    rec_real(r, "reference_volume", D(c.reference_volume.m3));
    rec_real(r, "amount_ideal", D(ci.amount.mol));
    rec_real(r, "mass_ideal", D(ci.mass.kg));
    rec_real(r, "reference_volume_ideal", D(ci.reference_volume.m3));
    rec_real(r, "deviation", 100.0 * (D(c.amount.mol) / D(ci.amount.mol) - 1.0));
    return GK_OK;
}

/* ------------------------------------------------------------------ word: leak */

/* clang-format off */
static const field leak_fields[] = {
    {"fluid", "fluid", F_TEXT, U_NONE, U_NONE, ""},
    {"model", "model", F_TEXT, U_NONE, U_NONE, ""},
    {"reference", "reference condition", F_TEXT, U_NONE, U_NONE, ""},
    {"volume", "test volume", F_REAL, GK_UNIT_M3, GK_UNIT_L, ""},
    {"p_start", "start pressure (absolute)", F_REAL, GK_UNIT_PA, GK_UNIT_BAR, ""},
    {"t_start", "start temperature", F_REAL, GK_UNIT_K, GK_UNIT_DEGC, ""},
    {"p_end", "end pressure (absolute)", F_REAL, GK_UNIT_PA, GK_UNIT_BAR, ""},
    {"t_end", "end temperature", F_REAL, GK_UNIT_K, GK_UNIT_DEGC, ""},
    {"elapsed", "elapsed time", F_REAL, U_NONE, U_NONE, "s"},
    {"mol_per_s", "amount lost", F_REAL, U_NONE, U_NONE, "mol/s"},
    {"mass_flow", "mass lost", F_REAL, GK_UNIT_KG_PER_S, GK_UNIT_G_PER_MIN, ""},
    {"reference_flow", "leak at reference", F_REAL, GK_UNIT_M3_PER_S, GK_UNIT_ML_PER_MIN, ""},
    {"reference_flow_ideal", "leak at reference, ideal gas", F_REAL, GK_UNIT_M3_PER_S, GK_UNIT_ML_PER_MIN, ""},
};
/* clang-format on */

static gk_status word_leak(const settings *set, args *a, record *r, detail *why) {
    const quantity *qv, *qp1, *qp2, *qt1, *qt2, *qd;
    gk_volume v;
    gk_pressure p1, p2;
    gk_temperature t1, t2;
    fluid_in f;
    gk_leak lk, lki;
    gk_status st;

    if ((st = need_word(a, 0, "fluid", why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_VOLUME, 0, "test volume", &qv, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_PRESSURE, 0, "start pressure", &qp1, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_PRESSURE, 1, "end pressure", &qp2, why)) != GK_OK) { return st; }
    if ((st = need(a, DIM_TEMPERATURE, 0, "temperature", &qt1, why)) != GK_OK) { return st; }
    qt2 = take(a, DIM_TEMPERATURE, 1);
    if (qt2 == NULL) { qt2 = qt1; /* one temperature: the same at start and end */ }
    if ((st = need(a, DIM_TIME, 0, "elapsed time", &qd, why)) != GK_OK) { return st; }
    if ((st = all_used(a, 1, why)) != GK_OK) { return st; }
    if ((st = parse_fluid(a->w[0], &f, why)) != GK_OK) { return st; }
    CHECK(gk_volume_from(R(qv->value), qv->unit, &v), "volume", qv->text);
    if ((st = to_pressure(qp1, set->ambient, &p1, why)) != GK_OK) { return st; }
    if ((st = to_pressure(qp2, set->ambient, &p2, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt1, &t1, why)) != GK_OK) { return st; }
    if ((st = to_temperature(qt2, &t2, why)) != GK_OK) { return st; }
    CHECK(gk_leak_rate_pressure_decay(set->model, as_fluid(&f), v, p1, t1, p2, t2, R(qd->value),
                                      set->ref, &lk),
          "leak of", a->w[0]);
    CHECK(gk_leak_rate_pressure_decay(GK_EOS_IDEAL, as_fluid(&f), v, p1, t1, p2, t2, R(qd->value),
                                      set->ref, &lki),
          "ideal leak of", a->w[0]);
    rec_text(r, "fluid", a->w[0]);
    rec_text(r, "model", model_name(set->model));
    rec_text(r, "reference", set->ref_name);
    rec_real(r, "volume", D(v.m3));
    rec_real(r, "p_start", D(p1.pa));
    rec_real(r, "t_start", D(t1.k));
    rec_real(r, "p_end", D(p2.pa));
    rec_real(r, "t_end", D(t2.k));
    rec_real(r, "elapsed", qd->value);
    rec_real(r, "mol_per_s", D(lk.mol_per_s));
    rec_real(r, "mass_flow", D(lk.mass_flow.kg_per_s));
    rec_real(r, "reference_flow", D(lk.reference_flow.m3_per_s));
    rec_real(r, "reference_flow_ideal", D(lki.reference_flow.m3_per_s));
    return GK_OK;
}

/* ------------------------------------------------------------------ word: gases */

/* clang-format off */
static const field gas_fields[] = {
    {"formula", "formula", F_TEXT, U_NONE, U_NONE, ""},
    {"name", "name", F_TEXT, U_NONE, U_NONE, ""},
    {"molar_mass", "molar mass", F_REAL, GK_UNIT_KG_PER_MOL, GK_UNIT_G_PER_MOL, ""},
    {"tc", "critical temperature", F_REAL, GK_UNIT_K, GK_UNIT_K, ""},
    {"pc", "critical pressure", F_REAL, GK_UNIT_PA, GK_UNIT_BAR, ""},
    {"omega", "acentric factor", F_REAL, U_NONE, U_NONE, ""},
    {"gamma", "cp/cv", F_REAL, U_NONE, U_NONE, ""},
    {"vdw_a", "van der Waals a", F_REAL, U_NONE, U_NONE, "Pa m6/mol2"},
    {"vdw_b", "van der Waals b", F_REAL, U_NONE, U_NONE, "m3/mol"},
};
/* clang-format on */

static void fill_gas(record *r, const gk_gas *g) {
    rec_text(r, "formula", g->formula != NULL ? g->formula : "");
    rec_text(r, "name", g->name != NULL ? g->name : "");
    rec_real(r, "molar_mass", D(g->molar_mass.kg_per_mol));
    rec_real(r, "tc", D(g->critical_temperature.k));
    rec_real(r, "pc", D(g->critical_pressure.pa));
    rec_real(r, "omega", D(g->acentric_factor));
    if (g->heat_capacity_ratio > R(0.0)) { rec_real(r, "gamma", D(g->heat_capacity_ratio)); }
    rec_real(r, "vdw_a", D(g->vdw_a));
    rec_real(r, "vdw_b", D(g->vdw_b));
}

static int word_gases(const settings *set, int argc) {
    size_t i, n = gk_gas_count();
    record r;
    if (argc > 0) {
        fprintf(stderr, "gkq: gases takes no arguments (%s)\n", gk_status_string(GK_ERR_ARGUMENT));
        return 2;
    }
    if (set->format == OUT_TEXT) {
        printf("%-10s %-22s %10s %9s %9s %7s %6s\n", "formula", "name", "M g/mol", "Tc K", "pc bar",
               "omega", "cp/cv");
        for (i = 0; i < n; i++) {
            const gk_gas *g = gk_gas_at(i);
            if (g == NULL) { break; }
            printf("%-10s %-22s %10.4f %9.2f %9.3f %7.3f ", g->formula ? g->formula : "",
                   g->name ? g->name : "", D(g->molar_mass.kg_per_mol) * 1000.0,
                   D(g->critical_temperature.k), D(g->critical_pressure.pa) / 1e5,
                   D(g->acentric_factor));
            if (g->heat_capacity_ratio > R(0.0)) {
                printf("%6.3f\n", D(g->heat_capacity_ratio));
            } else {
                printf("%6s\n", "-");
            }
        }
        return 0;
    }
    if (set->format == OUT_CSV) {
        rec_init(&r, gas_fields, sizeof gas_fields / sizeof gas_fields[0]);
        rec_csv_header(stdout, &r);
    }
    for (i = 0; i < n; i++) {
        const gk_gas *g = gk_gas_at(i);
        if (g == NULL) { break; }
        rec_init(&r, gas_fields, sizeof gas_fields / sizeof gas_fields[0]);
        fill_gas(&r, g);
        rec_print(stdout, set, &r, "gases", (long)(i + 1), GK_OK, "");
    }
    return 0;
}

/* ------------------------------------------------------------------ word table */

typedef gk_status (*word_fn)(const settings *, args *, record *, detail *);

static const struct word {
    const char *name;
    word_fn fn;
    const field *fields;
    size_t nfields;
    const char *title;
} words[] = {
    { "state", word_state, state_fields, sizeof state_fields / sizeof state_fields[0],
      "state of a gas or mixture" },
    { "convert", word_convert, convert_fields, sizeof convert_fields / sizeof convert_fields[0],
      "unit conversion" },
    { "speeds", word_speeds, speeds_fields, sizeof speeds_fields / sizeof speeds_fields[0],
      "molecular speeds and effusion" },
    { "water", word_water, water_fields, sizeof water_fields / sizeof water_fields[0],
      "water vapour pressure" },
    { "dew", word_dew, dew_fields, sizeof dew_fields / sizeof dew_fields[0],
      "dew point and wet gas" },
    { "contents", word_contents, contents_fields,
      sizeof contents_fields / sizeof contents_fields[0], "vessel contents" },
    { "leak", word_leak, leak_fields, sizeof leak_fields / sizeof leak_fields[0],
      "pressure-decay leak rate" },
};

static const struct word *find_word(const char *name) {
    size_t i;
    for (i = 0; i < sizeof words / sizeof words[0]; i++) {
        if (strcmp(words[i].name, name) == 0) { return &words[i]; }
    }
    return NULL;
}

/* ------------------------------------------------------------------ batch */

/* Splits one CSV line in place into at most max cells. Quotes ("...", "" for a quote) let a
   cell hold commas. Cells are trimmed of spaces. Returns the count, or -1 when malformed. */
static int split_csv(char *line, char **cells, int max) {
    int n = 0;
    char *p = line;
    for (;;) {
        char *start, *w;
        while (*p == ' ' || *p == '\t') { p++; }
        if (n >= max) { return -1; }
        start = w = p;
        if (*p == '"') {
            p++;
            for (;;) {
                if (*p == '\0') { return -1; }
                if (*p == '"') {
                    if (p[1] == '"') {
                        *w++ = '"';
                        p += 2;
                        continue;
                    }
                    p++;
                    break;
                }
                *w++ = *p++;
            }
            while (*p == ' ' || *p == '\t') { p++; }
            if (*p != ',' && *p != '\0') { return -1; }
        } else {
            while (*p != ',' && *p != '\0') { *w++ = *p++; }
            while (w > start && (w[-1] == ' ' || w[-1] == '\t')) { w--; }
        }
        cells[n++] = start;
        if (*p == '\0') {
            *w = '\0';
            break;
        }
        *w = '\0';
        p++;
    }
    return n;
}

/* Reads one line (without its newline) into buf. Returns -1 at the end of the input, else the
   number of bytes kept; *too_long is set when the line held more than cap - 1 bytes (the rest
   of it is read and dropped), *has_nul when it held a NUL byte. */
static long read_line(FILE *in, char *buf, size_t cap, int *too_long, int *has_nul) {
    size_t n = 0;
    int c, any = 0;
    *too_long = 0;
    *has_nul = 0;
    while ((c = getc(in)) != EOF) {
        any = 1;
        if (c == '\n') { break; }
        if (c == '\0') { *has_nul = 1; }
        if (n + 1 < cap) {
            buf[n++] = (char)c;
        } else {
            *too_long = 1;
        }
    }
    if (!any) { return -1; }
    buf[n] = '\0';
    return (long)n;
}

static int run_batch(const settings *set_in, const struct word *w) {
    settings set = *set_in;
    char line[GKQ_LINE_MAX + 1];
    long lineno = 0, rows = 0, failed = 0;
    record r;

    set.format = OUT_CSV;
    rec_init(&r, w->fields, w->nfields);
    rec_csv_header(stdout, &r);
    for (;;) {
        char *cells[GKQ_CELLS_MAX];
        int n, too_long, has_nul;
        detail why;
        args a;
        gk_status st;
        long got = read_line(stdin, line, sizeof line, &too_long, &has_nul);
        size_t len;

        if (got < 0) { break; }
        len = (size_t)got;
        lineno++;
        if (len > 0 && line[len - 1] == '\r') { line[--len] = '\0'; }
        why.text[0] = '\0';
        rec_init(&r, w->fields, w->nfields);
        if (too_long) {
            /* longer than GKQ_LINE_MAX: reported in its row, the rest of it skipped */
            rows++;
            failed++;
            rec_print(stdout, &set, &r, w->name, lineno, GK_ERR_PARSE, "line too long");
            continue;
        }
        if (has_nul) {
            rows++;
            failed++;
            rec_print(stdout, &set, &r, w->name, lineno, GK_ERR_PARSE, "NUL byte in line");
            continue;
        }
        {
            size_t k = 0;
            while (line[k] == ' ' || line[k] == '\t') { k++; }
            if (line[k] == '\0' || line[k] == '#') { continue; /* blank or comment */ }
        }
        rows++;
        n = split_csv(line, cells, GKQ_CELLS_MAX);
        if (n < 0) {
            failed++;
            rec_print(stdout, &set, &r, w->name, lineno, GK_ERR_PARSE,
                      "malformed CSV or too many cells");
            continue;
        }
        st = collect_args(n, cells, &a, &why);
        if (st == GK_OK) { st = w->fn(&set, &a, &r, &why); }
        if (st != GK_OK) {
            char msg[GKQ_TEXT_MAX + 128];
            failed++;
            snprintf(msg, sizeof msg, "%s: %s", why.text, gk_status_string(st));
            rec_init(&r, w->fields, w->nfields);
            rec_print(stdout, &set, &r, w->name, lineno, st, msg);
        } else {
            rec_print(stdout, &set, &r, w->name, lineno, GK_OK, "");
        }
    }
    fflush(stdout);
    if (failed > 0) {
        fprintf(stderr, "gkq batch %s: %ld of %ld rows failed (see their status column)\n", w->name,
                failed, rows);
        return 1;
    }
    return 0;
}

/* ------------------------------------------------------------------ usage and main */

static void usage(FILE *out) {
    fputs("gkq - gas-property queries on gaskit\n"
          "\n"
          "usage: gkq [options] WORD ARGUMENTS...\n"
          "\n"
          "words:\n"
          "  state FLUID P T               Z, molar volume, density, fugacity coefficient, roots\n"
          "  convert Q UNIT                a quantity in another unit (UNIT_g: gauge pressure)\n"
          "  speeds FLUID T [FLUID2] [P]   molecular speeds, speed of sound; Graham ratio to\n"
          "                                FLUID2; mean free path and wall flux at P\n"
          "  water T | water P             vapour pressure at T, or saturation temperature at P\n"
          "  dew PW | dew P T RH           dew point of a water partial pressure, or of a gas\n"
          "                                at total pressure P, temperature T, humidity RH\n"
          "  contents FLUID V P T          amount, mass and reference volume in a vessel\n"
          "  leak FLUID V P1 P2 T [T2] DT  leak rate from a pressure decay over time DT\n"
          "  gases                         the built-in gas table\n"
          "  batch WORD                    CSV rows of WORD's arguments on stdin, CSV out\n"
          "  help | version\n"
          "\n"
          "quantities carry their unit: 2.5bar 101.3kPa 25degC 77degF 300K 40L 2ft3 15min 60%\n"
          "  a gauge pressure ends in _g: 3.2bar_g 45psi_g -0.2bar_g (over the barometer, -b);\n"
          "  a pressure without a mark, or with _a, is absolute\n"
          "  quantities of different kinds may come in any order; two of one kind keep theirs\n"
          "FLUID: a gas by formula or name (N2, \"carbon dioxide\") or a mixture\n"
          "  \"CO2=5%;N2=balance\" (';' or ',' between components)\n"
          "\n"
          "options:\n"
          "  -m, --model M      ideal | vdw | rk | srk | pr      (default pr)\n"
          "  -r, --root R       stable | gas | liquid            (default stable)\n"
          "  -b, --barometer P  ambient pressure for _g readings (default 101.325kPa)\n"
          "  -R, --ref REF      reference condition: 0C 0C-100kPa 15C 20C 25C 60F or P@T\n"
          "                     (default 0C: 0 degC, 101.325 kPa)\n"
          "  -u, --units LIST   display units, e.g. bar,degF,L/min\n"
          "  -k                 machine output: key=value pairs, SI units\n"
          "  -j                 machine output: one JSON object per line, SI units\n"
          "\n"
          "exit status: 0 ok; 1 a calculation or input failed, or a batch row failed;\n"
          "2 the command line is wrong. Results are engineering estimates (docs/safety.md).\n",
          out);
}

/* Reads the value of an option given as "-x VALUE", "--long VALUE" or "--long=VALUE". */
static const char *option_value(int argc, char **argv, int *i, const char *shortname,
                                const char *longname) {
    const char *a = argv[*i];
    size_t ln = strlen(longname);
    if (strcmp(a, shortname) == 0 || strcmp(a, longname) == 0) {
        if (*i + 1 >= argc) { return NULL; }
        (*i)++;
        return argv[*i];
    }
    if (strncmp(a, longname, ln) == 0 && a[ln] == '=') { return a + ln + 1; }
    return NULL;
}

static int is_option(const char *a) {
    return a[0] == '-' && (isalpha((unsigned char)a[1]) || a[1] == '-');
}

static int fail_usage(const char *what, const char *arg, gk_status st) {
    fprintf(stderr, "gkq: %s '%.200s': %s\n", what, arg, gk_status_string(st));
    fprintf(stderr, "gkq: try 'gkq help'\n");
    return 2;
}

int main(int argc, char **argv) {
    settings set;
    char *rest[GKQ_CELLS_MAX + 2];
    int nrest = 0;
    int i;
    detail why;
    const char *units_list = NULL;
    const char *ref_text = "0C";
    const char *baro_text = NULL;

    memset(&set, 0, sizeof set);
    set.model = GK_EOS_PENG_ROBINSON;
    set.root = GK_ROOT_STABLE;
    set.ambient.pa = GK_STANDARD_ATMOSPHERE_PA;
    set.format = OUT_TEXT;
    why.text[0] = '\0';

    for (i = 1; i < argc; i++) {
        const char *a = argv[i];
        const char *v;
        if (!is_option(a)) {
            if (nrest >= GKQ_CELLS_MAX + 2) {
                return fail_usage("too many arguments at", a, GK_ERR_ARGUMENT);
            }
            rest[nrest++] = argv[i];
            continue;
        }
        if (strcmp(a, "-k") == 0) {
            set.format = OUT_KV;
            continue;
        }
        if (strcmp(a, "-j") == 0) {
            set.format = OUT_JSON;
            continue;
        }
        if (strcmp(a, "-h") == 0 || strcmp(a, "--help") == 0) {
            usage(stdout);
            return 0;
        }
        if ((v = option_value(argc, argv, &i, "-m", "--model")) != NULL) {
            if (!parse_model(v, &set.model)) {
                return fail_usage("unknown model", v, GK_ERR_NOT_FOUND);
            }
            continue;
        }
        if ((v = option_value(argc, argv, &i, "-r", "--root")) != NULL) {
            if (!parse_root(v, &set.root)) {
                return fail_usage("unknown root", v, GK_ERR_NOT_FOUND);
            }
            continue;
        }
        if ((v = option_value(argc, argv, &i, "-b", "--barometer")) != NULL) {
            baro_text = v;
            continue;
        }
        if ((v = option_value(argc, argv, &i, "-R", "--ref")) != NULL) {
            ref_text = v;
            continue;
        }
        if ((v = option_value(argc, argv, &i, "-u", "--units")) != NULL) {
            units_list = v;
            continue;
        }
        return fail_usage("unknown option or missing value", a, GK_ERR_ARGUMENT);
    }

    if (baro_text != NULL) {
        quantity q;
        gk_status st = parse_quantity(baro_text, &q, &why);
        if (st == GK_OK && (q.d != DIM_PRESSURE || q.gauge)) { st = GK_ERR_ARGUMENT; }
        if (st == GK_OK) { st = gk_pressure_from(R(q.value), q.unit, &set.ambient); }
        if (st != GK_OK) {
            return fail_usage("barometer must be an absolute pressure, not", baro_text, st);
        }
    }
    {
        gk_status st = parse_reference(ref_text, &set, &set.ref, &why);
        if (st != GK_OK) { return fail_usage("reference condition", ref_text, st); }
        copy_text(set.ref_name, sizeof set.ref_name, ref_text);
    }
    if (units_list != NULL) {
        char buf[GKQ_TEXT_MAX];
        char *tok, *save;
        if (strlen(units_list) >= sizeof buf) {
            return fail_usage("unit list too long", units_list, GK_ERR_PARSE);
        }
        copy_text(buf, sizeof buf, units_list);
        for (tok = buf; tok != NULL; tok = save) {
            gk_unit u;
            gk_status st;
            save = strchr(tok, ',');
            if (save != NULL) { *save++ = '\0'; }
            st = gk_unit_parse(tok, &u);
            if (st != GK_OK) { return fail_usage("unknown display unit", tok, st); }
            if (set.show_count < GK_UNIT_COUNT) { set.show[set.show_count++] = u; }
        }
    }

    if (nrest == 0 || strcmp(rest[0], "help") == 0) {
        usage(nrest == 0 ? stderr : stdout);
        return nrest == 0 ? 2 : 0;
    }
    if (strcmp(rest[0], "version") == 0) {
        printf("gkq %s (gaskit %s, %s)\n", gk_version(), gk_version(),
               (gk_build_flags() & GK_BUILD_FLOAT) ? "float" : "double");
        return 0;
    }
    if (strcmp(rest[0], "gases") == 0) { return word_gases(&set, nrest - 1); }
    if (strcmp(rest[0], "batch") == 0) {
        const struct word *w;
        if (nrest != 2) {
            return fail_usage("batch takes one word, got", nrest > 2 ? rest[2] : "nothing",
                              GK_ERR_ARGUMENT);
        }
        w = find_word(rest[1]);
        if (w == NULL) { return fail_usage("unknown word for batch", rest[1], GK_ERR_NOT_FOUND); }
        return run_batch(&set, w);
    }
    {
        const struct word *w = find_word(rest[0]);
        args a;
        record r;
        gk_status st;
        if (w == NULL) { return fail_usage("unknown word", rest[0], GK_ERR_NOT_FOUND); }
        st = collect_args(nrest - 1, rest + 1, &a, &why);
        rec_init(&r, w->fields, w->nfields);
        if (st == GK_OK) { st = w->fn(&set, &a, &r, &why); }
        if (st != GK_OK) {
            fprintf(stderr, "gkq %s: %s: %s\n", w->name, why.text[0] ? why.text : "error",
                    gk_status_string(st));
            return 1;
        }
        if (set.format == OUT_TEXT && w->fields == convert_fields) {
            /* a float build carries about 7 significant digits: print no more */
            printf("%s = %.*g %s\n", r.s[0], (gk_build_flags() & GK_BUILD_FLOAT) ? 7 : 10, r.v[1],
                   r.s[2]);
            return 0;
        }
        if (set.format == OUT_TEXT) {
            if (w->fields == state_fields || strcmp(w->name, "contents") == 0 ||
                strcmp(w->name, "leak") == 0) {
                printf("%s (%s)\n", w->title, model_title(set.model));
            } else {
                printf("%s\n", w->title);
            }
        }
        rec_print(stdout, &set, &r, w->name, 0, GK_OK, "");
        return 0;
    }
}
