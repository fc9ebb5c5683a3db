/*
 * gkq.h - the parts of gkq (gaskit query) shared between its files.
 *
 *   gkq_units.c   the unit spellings a technician types, quantities, display units
 *   gkq_input.c   arguments, fluids, options' values, messages, the wet-gas and phase checks
 *   gkq_output.c  records and the text, key=value, JSON-lines and CSV formats; checked writes
 *   gkq_words.c   the words that read a state (state, convert, speeds, water, dew, contents, leak,
 *                 gases, units) and the steps they share
 *   gkq_solve.c   the words that solve for another unknown (flow, fill, retemp, rh, effusion,
 *                 reldensity)
 *   gkq_batch.c   batch mode: a header row or plain rows in, CSV or JSON lines out
 *   gkq_main.c    the word table (with each word's help and batch columns), options, main
 *
 * gkq uses only the public API of gaskit (gaskit/gaskit.h). Unlike the library it may use stdio
 * and strtod; it must still never crash on any input.
 */
#ifndef GKQ_H
#define GKQ_H

#include <stdio.h>

#include "gaskit/gaskit.h"

/* The model gkq uses when -m is not given: the most accurate model the library carries. */
#define GKQ_DEFAULT_MODEL GK_EOS_BEST
/* The model that decides whether a pure gas or a mixture is liquid at a state, whatever model
   computes the answer (the ideal gas has no liquid of its own): the most accurate one, whose
   stable root tells the phase (Span-Wagner where it covers the fluid, else Peng-Robinson). */
#define GKQ_PHASE_MODEL GK_EOS_BEST

#define GKQ_LINE_MAX 1024 /* longest batch line (bytes, without the newline) */
#define GKQ_CELLS_MAX 16  /* most arguments of a word (a batch row without a header) */
#define GKQ_COLS_MAX 64   /* most columns of a batch file with a header row */
#define GKQ_TEXT_MAX 320  /* longest message or fluid text kept */
#define GKQ_FIELDS_MAX 28 /* most fields in one output record */
#define GKQ_SHOW_MAX 16   /* most display units */
#define GKQ_COLUNITS_MAX 16

/* ------------------------------------------------------------------ quantities and units */

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

/* A unit as gkq reads it: a library unit times a factor, possibly a gauge pressure or a volume
   flow at a named reference condition. */
typedef struct tunit {
    const char *name; /* the spelling */
    dim d;
    gk_unit base;     /* library unit the value is in after multiplying; GK_UNIT_COUNT: none */
    double mult;      /* value in base = value in this unit * mult */
    int gauge;        /* 1: a gauge pressure (over the barometer) */
    int ref;          /* volume flows: 1 + index of the reference condition (refs[]); 0 actual */
    const char *what; /* what the spelling means, for `gkq units` */
} tunit;

/* A quantity as written: "2.5bar", "3.2psig", "25degC", "15min", "60%", "0.8". */
typedef struct quantity {
    double value; /* in the base unit (a percentage divided by 100, time in s) */
    dim d;
    gk_unit unit; /* base library unit */
    int gauge;
    int ref;
    const char *uname; /* the unit's spelling and meaning ("" for none) */
    const char *uwhat;
    const char *text; /* the argument as given */
    char where[40];   /* "argument 3" or "column p" */
} quantity;

/* A message about an input: what was wrong, with the argument and its text. */
typedef struct detail {
    char text[GKQ_TEXT_MAX];
} detail;

/* A named reference condition. */
typedef struct refcond {
    const char *name; /* -R spelling */
    gk_reference_id id;
    const char *what; /* its definition and source */
} refcond;

extern const refcond gkq_refs[];
extern const size_t gkq_nrefs;

const char *dim_name(dim d);
gk_unit si_unit(dim d);
int unit_find(const char *text, tunit *out);
size_t text_distance(const char *a, const char *b);
void unit_suggest(const char *text, char *buf, size_t cap);
gk_status parse_quantity(const char *s, const char *where, quantity *q, detail *why);
int si_to_shown(double si, dim d, const tunit *u, double *shown);
void unit_tag(const char *name, char *buf, size_t cap);
int list_units(FILE *out);

/* ------------------------------------------------------------------ settings */

typedef enum out_format {
    OUT_TEXT,
    OUT_KV,
    OUT_JSON,
    OUT_CSV
} out_format;

typedef struct colunit {
    char name[32];
    tunit unit;
} colunit;

typedef struct settings {
    gk_eos model;
    gk_root root;
    int root_given;
    gk_pressure baro; /* barometer for gauge readings (and at the start of a leak test) */
    gk_pressure baro_end;
    int baro_given, baro_end_given;
    gk_reference ref;
    int ref_given;
    char ref_name[48];
    char ref_what[160];
    out_format format;
    tunit show[GKQ_SHOW_MAX]; /* display units, in the order given */
    size_t nshow;
    double rh; /* --rh as a fraction */
    int has_rh;
    colunit colunits[GKQ_COLUNITS_MAX]; /* batch: --units NAME=UNIT */
    size_t ncolunits;
} settings;

const char *model_name(gk_eos e);
const char *model_title(gk_eos e);
int parse_model(const char *s, gk_eos *out);
void model_list(char *buf, size_t cap, const char *sep);
int parse_root(const char *s, gk_root *out);
gk_status parse_reference(const char *s, const settings *set, gk_reference *out, char *what,
                          size_t whatcap, detail *why);
void reference_describe(gk_reference r, char *buf, size_t cap);

/* ------------------------------------------------------------------ messages */

void say(detail *why, const char *fmt, ...)
#if defined(__GNUC__)
    __attribute__((format(printf, 2, 3)))
#endif
    ;
void blame(detail *why, const quantity *q, const char *fmt, ...)
#if defined(__GNUC__)
    __attribute__((format(printf, 3, 4)))
#endif
    ;
const char *plain_status(gk_status st);
const char *status_token(gk_status st);
void copy_text(char *dst, size_t cap, const char *src);
int same_ci(const char *a, const char *b);

/* ------------------------------------------------------------------ arguments of a word */

typedef struct args {
    size_t nq;
    quantity q[GKQ_CELLS_MAX];
    size_t nw;
    const char *w[GKQ_CELLS_MAX];
    char wwhere[GKQ_CELLS_MAX][40];
    int used_q[GKQ_CELLS_MAX];
    size_t wexp; /* words the word takes (for messages about a stray word) */
} args;

gk_status collect_args(int argc, char **argv, const char *const *where, args *a, detail *why);
const quantity *take(args *a, dim d);
gk_status need(args *a, dim d, const char *what, const quantity **out, detail *why);
gk_status need_word(const args *a, size_t k, const char *what, detail *why);
gk_status all_used(const args *a, size_t words_expected, const char *wname, detail *why);
gk_status to_pressure(const quantity *q, gk_pressure baro, gk_pressure *out, detail *why);
gk_status to_temperature(const quantity *q, gk_temperature *out, detail *why);
gk_status to_volume(const quantity *q, gk_volume *out, detail *why);
gk_status fraction_of(const quantity *q, const char *what, double *out, detail *why);

/* A fluid: a gas of the table or a mixture, dry or made wet with --rh. */
typedef struct fluid_in {
    const char *text;
    const gk_gas *gas; /* a pure gas (when not is_mix) */
    gk_mixture mix;
    int is_mix;
    gk_molar_mass m;
    double tc_k; /* critical temperature, or the pseudo-critical sum x_i Tc_i of a mixture */
    double pc_pa;
    double x_water; /* mole fraction of water (0 when none) */
} fluid_in;

gk_status parse_fluid(const char *text, const char *where, fluid_in *f, detail *why);
gk_status wet_fluid(fluid_in *f, double rh, gk_pressure p, gk_temperature t, detail *why);
gk_fluid as_fluid(const fluid_in *f);
gk_status check_water(const fluid_in *f, gk_pressure p, gk_temperature t, detail *why);
gk_status check_gas_phase(const fluid_in *f, gk_pressure p, gk_temperature t, const char *what,
                          detail *why);
int barometer_odd(gk_pressure b);
gk_status explain(gk_status st, const char *what, const fluid_in *f, detail *why);

/* ------------------------------------------------------------------ output records */

typedef enum fkind {
    F_REAL,
    F_TEXT
} fkind;

/* One output field: its machine key (without a unit), its label for people, its kind, and its
   dimension (DIM_NONE: a plain number, with the fixed unit text, which is also the key's unit
   suffix). Real fields with a dimension are held in SI and shown in the default (or a -u)
   display unit; their machine key carries the unit ("p_Pa", "p_bar"). */
typedef struct field {
    const char *key;
    const char *label;
    fkind kind;
    dim d;
    const char *show;  /* default display unit for people */
    const char *fixed; /* unit of a field without a dimension; its key suffix (tag) */
} field;

typedef struct record {
    const field *f;
    size_t n;
    int set[GKQ_FIELDS_MAX];
    double v[GKQ_FIELDS_MAX];
    char s[GKQ_FIELDS_MAX][96];
    gk_eos served; /* the model that computed the record (with best: the one chosen) */
    int has_served;
} record;

void rec_init(record *r, const field *f, size_t n);
void rec_real(record *r, const char *key, double v);
void rec_text(record *r, const char *key, const char *s);
void field_key(const settings *set, const field *f, char *buf, size_t cap);
void rec_print(FILE *out, const settings *set, const record *r, const char *wname);
void print_json_string(FILE *out, const char *s);
void print_csv_text(FILE *out, const char *s);
int output_failed(FILE *out);
int finish_output(FILE *out);

/* ------------------------------------------------------------------ words */

typedef gk_status (*word_fn)(const settings *, args *, record *, detail *);
typedef int (*run_fn)(const settings *, int, char **);

/* A role of a word's argument, for batch header columns. */
typedef struct role {
    const char *name; /* column name ("p", "T", "fluid"); aliases after '|' */
    dim d;            /* DIM_NONE: a word (fluid, unit) */
    int special;      /* ROLE_* */
} role;

enum {
    ROLE_ARG = 0, /* an argument of the word, in role order */
    ROLE_RH,      /* relative humidity of the row (like --rh) */
    ROLE_BARO,    /* barometer of the row (like -b) */
    ROLE_BARO_END /* barometer at the end of a leak test (like --barometer-end) */
};

enum {
    W_MODEL = 1,  /* the title names the model */
    W_CONVERT = 2 /* the one-line human output of convert */
};

typedef struct word {
    const char *name;
    word_fn fn; /* a computing word (usable in batch), or NULL */
    run_fn run; /* a listing word (gases, units, help, version, batch) */
    const field *fields;
    size_t nfields;
    const char *title;
    unsigned flags;
    const role *roles;
    const char *usage;
    const char *help;
    const char *ex1;
    const char *ex2;
} word;

extern const word gkq_words[];
extern const size_t gkq_nwords;
const word *find_word(const char *name);
size_t word_nfields(const word *w);
int word_help(FILE *out, const word *w);
void usage(FILE *out);
int run_word(const settings *set, const word *w, int argc, char **argv);
int run_batch(const settings *set, const word *w);

/* computing words (gkq_words.c, gkq_solve.c) */
gk_status word_state(const settings *set, args *a, record *r, detail *why);
gk_status word_convert(const settings *set, args *a, record *r, detail *why);
gk_status word_speeds(const settings *set, args *a, record *r, detail *why);
gk_status word_water(const settings *set, args *a, record *r, detail *why);
gk_status word_dew(const settings *set, args *a, record *r, detail *why);
gk_status word_contents(const settings *set, args *a, record *r, detail *why);
gk_status word_leak(const settings *set, args *a, record *r, detail *why);
gk_status word_flow(const settings *set, args *a, record *r, detail *why);
gk_status word_fill(const settings *set, args *a, record *r, detail *why);
gk_status word_retemp(const settings *set, args *a, record *r, detail *why);
gk_status word_rh(const settings *set, args *a, record *r, detail *why);
gk_status word_effusion(const settings *set, args *a, record *r, detail *why);
gk_status word_reldensity(const settings *set, args *a, record *r, detail *why);
int word_gases(const settings *set, int argc, char **argv);
int word_units(const settings *set, int argc, char **argv);

extern const field state_fields[], convert_fields[], speeds_fields[], water_fields[], dew_fields[],
    contents_fields[], leak_fields[], flow_fields[], fill_fields[], retemp_fields[], rh_fields[],
    effusion_fields[], reldensity_fields[];
extern const size_t state_nfields, convert_nfields, speeds_nfields, water_nfields, dew_nfields,
    contents_nfields, leak_nfields, flow_nfields, fill_nfields, retemp_nfields, rh_nfields,
    effusion_nfields, reldensity_nfields;

/* Shared steps of the words. */
gk_status word_pressure(const settings *set, const quantity *q, int at_end, record *r,
                        const char *key, gk_pressure *out, detail *why);
gk_status use_model(const settings *set, const fluid_in *f, gk_pressure p, gk_temperature t,
                    settings *out, record *r);
void rec_reference(record *r, const settings *set);
const char *branch_text(const gk_eos_result *res);

#define GKQ_ARRAY_SIZE(a) (sizeof(a) / sizeof((a)[0]))

#endif /* GKQ_H */
