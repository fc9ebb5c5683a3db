/*
 * gkq_main.c - the word table, help, options and main of gkq (gaskit query), the command-line
 * face of gaskit for bench checks and shell pipelines.
 *
 *   gkq [options] WORD [ARGUMENTS...]        gkq help, gkq help WORD, docs/guide.md
 *
 * Exit status: 0 success; 1 a calculation, an input or a write failed (a message on stderr; in
 * batch mode: at least one row failed, all rows still written); 2 the command line itself is
 * wrong.
 */
#include <errno.h>
#include <math.h>
#include <string.h>

#include "gkq.h"

/* ------------------------------------------------------------------ the word table */

/* clang-format off */
static const role state_roles[] = {
    {"fluid|gas", DIM_NONE, ROLE_ARG}, {"p|pressure", DIM_PRESSURE, ROLE_ARG},
    {"T|temperature", DIM_TEMPERATURE, ROLE_ARG}, {"rh", DIM_NUMBER, ROLE_RH},
    {"barometer", DIM_PRESSURE, ROLE_BARO}, {NULL, DIM_NONE, 0}};
static const role convert_roles[] = {
    {"quantity|from", DIM_NONE, ROLE_ARG}, {"unit|to", DIM_NONE, ROLE_ARG},
    {"barometer", DIM_PRESSURE, ROLE_BARO}, {NULL, DIM_NONE, 0}};
static const role speeds_roles[] = {
    {"fluid|gas", DIM_NONE, ROLE_ARG}, {"T|temperature", DIM_TEMPERATURE, ROLE_ARG},
    {"other|compare", DIM_NONE, ROLE_ARG}, {"p|pressure", DIM_PRESSURE, ROLE_ARG},
    {NULL, DIM_NONE, 0}};
static const role water_roles[] = {
    {"T|temperature", DIM_TEMPERATURE, ROLE_ARG}, {"p|pressure", DIM_PRESSURE, ROLE_ARG},
    {NULL, DIM_NONE, 0}};
static const role dew_roles[] = {
    {"p|pressure", DIM_PRESSURE, ROLE_ARG}, {"T|temperature", DIM_TEMPERATURE, ROLE_ARG},
    {"rh", DIM_NUMBER, ROLE_ARG}, {"barometer", DIM_PRESSURE, ROLE_BARO}, {NULL, DIM_NONE, 0}};
static const role contents_roles[] = {
    {"fluid|gas", DIM_NONE, ROLE_ARG}, {"V|volume|vessel", DIM_VOLUME, ROLE_ARG},
    {"p|pressure", DIM_PRESSURE, ROLE_ARG}, {"T|temperature", DIM_TEMPERATURE, ROLE_ARG},
    {"rh", DIM_NUMBER, ROLE_RH}, {"barometer", DIM_PRESSURE, ROLE_BARO}, {NULL, DIM_NONE, 0}};
static const role leak_roles[] = {
    {"fluid|gas", DIM_NONE, ROLE_ARG}, {"V|volume", DIM_VOLUME, ROLE_ARG},
    {"p_start|p1", DIM_PRESSURE, ROLE_ARG}, {"p_end|p2", DIM_PRESSURE, ROLE_ARG},
    {"T_start|T1|T", DIM_TEMPERATURE, ROLE_ARG}, {"T_end|T2", DIM_TEMPERATURE, ROLE_ARG},
    {"elapsed|dt|time", DIM_TIME, ROLE_ARG}, {"rh", DIM_NUMBER, ROLE_RH},
    {"barometer|barometer_start", DIM_PRESSURE, ROLE_BARO},
    {"barometer_end", DIM_PRESSURE, ROLE_BARO_END}, {NULL, DIM_NONE, 0}};
static const role flow_roles[] = {
    {"fluid|gas", DIM_NONE, ROLE_ARG}, {"q|flow", DIM_NONE, ROLE_ARG},
    {"p|pressure", DIM_PRESSURE, ROLE_ARG}, {"T|temperature", DIM_TEMPERATURE, ROLE_ARG},
    {"rh", DIM_NUMBER, ROLE_RH}, {"barometer", DIM_PRESSURE, ROLE_BARO}, {NULL, DIM_NONE, 0}};
static const role fill_roles[] = {
    {"fluid|gas", DIM_NONE, ROLE_ARG}, {"V|volume|vessel", DIM_VOLUME, ROLE_ARG},
    {"T|temperature", DIM_TEMPERATURE, ROLE_ARG}, {"target|amount|mass", DIM_NONE, ROLE_ARG},
    {"barometer", DIM_PRESSURE, ROLE_BARO}, {NULL, DIM_NONE, 0}};
static const role retemp_roles[] = {
    {"fluid|gas", DIM_NONE, ROLE_ARG}, {"p|p_start|pressure", DIM_PRESSURE, ROLE_ARG},
    {"T_start|T1", DIM_TEMPERATURE, ROLE_ARG}, {"T_end|T2", DIM_TEMPERATURE, ROLE_ARG},
    {"barometer", DIM_PRESSURE, ROLE_BARO}, {NULL, DIM_NONE, 0}};
static const role rh_roles[] = {
    {"T|temperature", DIM_TEMPERATURE, ROLE_ARG}, {"dew_point|Td", DIM_TEMPERATURE, ROLE_ARG},
    {"p|pressure", DIM_PRESSURE, ROLE_ARG}, {"barometer", DIM_PRESSURE, ROLE_BARO},
    {NULL, DIM_NONE, 0}};
static const role effusion_roles[] = {
    {"reference_gas|gas", DIM_NONE, ROLE_ARG}, {"time_unknown|t1", DIM_TIME, ROLE_ARG},
    {"time_reference|t2", DIM_TIME, ROLE_ARG}, {NULL, DIM_NONE, 0}};
static const role reldensity_roles[] = {
    {"fluid|gas", DIM_NONE, ROLE_ARG}, {"p|pressure", DIM_PRESSURE, ROLE_ARG},
    {"T|temperature", DIM_TEMPERATURE, ROLE_ARG}, {"barometer", DIM_PRESSURE, ROLE_BARO},
    {NULL, DIM_NONE, 0}};
/* clang-format on */

static int run_help(const settings *set, int argc, char **argv);
static int run_version(const settings *set, int argc, char **argv);
static int run_batch_word(const settings *set, int argc, char **argv);

/* clang-format off */
const word gkq_words[] = {
    {"state", word_state, NULL, state_fields, 0, "state of a gas or mixture", W_MODEL, state_roles,
     "state FLUID P T",
     "Z, molar volume, density, fugacity, every real root and the branch returned (gas, liquid,\n"
     "or supercritical: a lone root above the critical temperature), the ideal-gas density\n"
     "beside. --rh makes the gas wet; -r gas|liquid asks for a branch (refused where it does\n"
     "not exist).",
     "gkq state N2 200bar 15degC", "gkq -r liquid -m srk state CO2 50bar 280K"},
    {"convert", word_convert, NULL, convert_fields, 0, "unit conversion", W_CONVERT, convert_roles,
     "convert QUANTITY UNIT",
     "QUANTITY in another unit of the same kind; a gauge unit (psig, barg, UNIT_g) on either\n"
     "side converts over the barometer (-b), which is printed.",
     "gkq convert 3.2psig kPa", "gkq -b 950hPa convert 3bar barg"},
    {"speeds", word_speeds, NULL, speeds_fields, 0, "molecular speeds and effusion", 0,
     speeds_roles, "speeds FLUID T [FLUID2] [P]",
     "Most probable, mean and rms molecular speed and the ideal-gas speed of sound; with FLUID2\n"
     "the Graham's-law effusion ratio; with P the wall flux and mean free path.",
     "gkq speeds He 20degC N2", "gkq speeds N2 300K 1Pa"},
    {"water", word_water, NULL, water_fields, 0, "water vapour pressure", 0, water_roles,
     "water T | water P",
     "Vapour pressure of water (of ice below 0.01 degC) at T, or the saturation temperature at\n"
     "P (IAPWS-IF97, IAPWS 2011).",
     "gkq water 25degC", "gkq water 1atm"},
    {"dew", word_dew, NULL, dew_fields, 0, "dew point and wet gas", 0, dew_roles,
     "dew PW | dew P T RH",
     "Dew (frost) point of a water partial pressure PW; or, for a gas at total pressure P,\n"
     "temperature T and relative humidity RH (45% or 0.45), the water partial pressure, mole\n"
     "fraction, dry-gas pressure and dew point.",
     "gkq dew 1atm 22degC 100%", "gkq dew 2.3kPa"},
    {"contents", word_contents, NULL, contents_fields, 0, "vessel contents", W_MODEL,
     contents_roles, "contents FLUID V P T",
     "Amount, mass and volume at the reference condition (-R) in a vessel of volume V, with the\n"
     "ideal-gas figures beside. A liquefied gas is refused under every model: weigh it.",
     "gkq -b 26.42inHg contents N2 50L 2150psig 71.6F", "gkq --rh 60% contents air 200L 8barg 25C"},
    {"leak", word_leak, NULL, leak_fields, 0, "pressure-decay leak rate", W_MODEL, leak_roles,
     "leak FLUID V P1 P2 T [T2] DT",
     "Leak rate of a closed volume V whose pressure fell from P1 to P2 over DT (T2: the end\n"
     "temperature, if it changed), as amount, mass and volume flow at the reference condition.\n"
     "Gauge readings are taken over the barometer at the start (-b) and at the end\n"
     "(--barometer-end), which are printed.",
     "gkq leak N2 0.85L 87psig 86.62psig 70.2F 69.8F 15min",
     "gkq -b 1013hPa --barometer-end 1009hPa leak N2 2L 3barg 2.99barg 20degC 1h"},
    {"flow", word_flow, NULL, flow_fields, 0, "flow conversion", W_MODEL, flow_roles,
     "flow FLUID Q P T",
     "A flow Q given as an actual volume flow at the line pressure P and temperature T (L/min,\n"
     "m3/h, L/s, ft3/h ...), as a volume flow at a named reference condition (sccm, slpm, SCFM,\n"
     "Nm3/h: see 'gkq units'), or as a mass flow (kg/h, g/h ...), in all three forms. The\n"
     "reference of the output is -R, else the one the flow's unit names.",
     "gkq flow N2 200sccm 1.5barg 23degC", "gkq -R 15C flow \"CH4=90%;C2H6=10%\" 12kg/h 4bar 10C"},
    {"fill", word_fill, NULL, fill_fields, 0, "fill pressure for an amount", W_MODEL, fill_roles,
     "fill FLUID V T AMOUNT|MASS",
     "The pressure at which a vessel of volume V at temperature T holds the given amount (mol)\n"
     "or mass: absolute, and as a gauge reading over the barometer (-b).",
     "gkq fill N2 50L 15degC 9.5kg", "gkq -m ideal fill Ar 10L 20degC 120mol"},
    {"retemp", word_retemp, NULL, retemp_fields, 0, "closed vessel after a temperature change",
     W_MODEL, retemp_roles, "retemp FLUID P T1 T2",
     "The pressure of a closed vessel at P and T1 once it is at T2 (same amount, same volume).",
     "gkq retemp N2 200barg 15degC 45degC", "gkq retemp CO2 40bar 60C 35C"},
    {"rh", word_rh, NULL, rh_fields, 0, "relative humidity from a dew point", 0, rh_roles,
     "rh T DEWPOINT [P]",
     "Relative humidity of gas at temperature T whose dew (frost) point is DEWPOINT; with the\n"
     "total pressure P also the water mole fraction.",
     "gkq rh 22degC 12degC", "gkq rh 25C 5C 1atm"},
    {"effusion", word_effusion, NULL, effusion_fields, 0, "molar mass from effusion times", 0,
     effusion_roles, "effusion REFGAS T_UNKNOWN T_REF",
     "Molar mass of an unknown gas from the times the same amount of it and of the reference\n"
     "gas take to effuse (Graham's law), and the table's gas nearest to it.",
     "gkq effusion O2 95s 60s", "gkq effusion N2 2.1min 1.5min"},
    {"reldensity", word_reldensity, NULL, reldensity_fields, 0, "relative density", W_MODEL,
     reldensity_roles, "reldensity FLUID [P T]",
     "Density relative to dry air at the same P and T (at the reference condition -R when no\n"
     "state is given), real and ideal-gas.",
     "gkq reldensity CO2", "gkq reldensity \"CH4=90%;C2H6=10%\" 50bar 10C"},
    {"gases", NULL, word_gases, NULL, 0, "", 0, NULL, "gases",
     "The built-in gas table (-k and -j: every column, in SI).", "gkq gases", "gkq -j gases"},
    {"units", NULL, word_units, NULL, 0, "", 0, NULL, "units",
     "Every unit spelling gkq reads, by quantity, with the reference condition of each flow\n"
     "spelling.", "gkq units", "gkq units | grep -i scfm"},
    {"batch", NULL, run_batch_word, NULL, 0, "", 0, NULL, "batch WORD",
     "Reads rows of WORD's arguments from standard input and writes one result row per input\n"
     "row (CSV, or JSON lines with -j, key=value lines with -k). With a header row the columns\n"
     "are named (any order; a unit in the name: p_bar, T_degC, or --units p=bar,T=degC);\n"
     "other columns are passed through. Delimiters: comma, semicolon or tab; a UTF-8 BOM is\n"
     "skipped. Without a header each row holds WORD's arguments as on the command line.",
     "gkq batch state < rows.csv",
     "gkq -j --units p=psig,T=F batch contents < log.csv"},
    {"help", NULL, run_help, NULL, 0, "", 0, NULL, "help [WORD]",
     "This text, or the help of one word.", "gkq help", "gkq help flow"},
    {"version", NULL, run_version, NULL, 0, "", 0, NULL, "version",
     "The versions of gkq and of the gaskit library it runs on (also -V, --version).",
     "gkq version", "gkq -V"},
};
/* clang-format on */
const size_t gkq_nwords = GKQ_ARRAY_SIZE(gkq_words);

/* The field counts (a table of structs cannot hold the size of an array of another file). */
size_t word_nfields(const word *w) {
    static const struct {
        const field *f;
        const size_t *n;
    } counts[] = { { state_fields, &state_nfields },
                   { convert_fields, &convert_nfields },
                   { speeds_fields, &speeds_nfields },
                   { water_fields, &water_nfields },
                   { dew_fields, &dew_nfields },
                   { contents_fields, &contents_nfields },
                   { leak_fields, &leak_nfields },
                   { flow_fields, &flow_nfields },
                   { fill_fields, &fill_nfields },
                   { retemp_fields, &retemp_nfields },
                   { rh_fields, &rh_nfields },
                   { effusion_fields, &effusion_nfields },
                   { reldensity_fields, &reldensity_nfields } };
    size_t i;
    for (i = 0; i < GKQ_ARRAY_SIZE(counts); i++) {
        if (counts[i].f == w->fields) { return *counts[i].n; }
    }
    return 0;
}

const word *find_word(const char *name) {
    size_t i;
    for (i = 0; i < gkq_nwords; i++) {
        if (strcmp(gkq_words[i].name, name) == 0) { return &gkq_words[i]; }
    }
    return NULL;
}

static void word_suggest(const char *text, char *buf, size_t cap) {
    size_t i, bestd = 99;
    const char *best = NULL;
    for (i = 0; i < gkq_nwords; i++) {
        size_t d = text_distance(text, gkq_words[i].name);
        if (d < bestd) {
            bestd = d;
            best = gkq_words[i].name;
        }
    }
    if (best != NULL && bestd <= 2) {
        snprintf(buf, cap, " (did you mean '%s'?)", best);
    } else {
        buf[0] = '\0';
    }
}

/* ------------------------------------------------------------------ help */

void usage(FILE *out) {
    size_t i;
    char models[160];
    fputs("gkq - gas-property queries on gaskit\n\nusage: gkq [options] WORD ARGUMENTS...\n\n"
          "words:\n",
          out);
    for (i = 0; i < gkq_nwords; i++) {
        const word *w = &gkq_words[i];
        fprintf(out, "  %-30s %s\n", w->usage, w->title[0] ? w->title : "");
    }
    fputs("\nquantities carry their unit: 2.5bar 30psig 1.2barg 101.3kPa 25degC 77F 300K 40L\n"
          "  15min 200sccm 5slpm 12g/h 45%  ('gkq units' lists every spelling)\n"
          "  a gauge reading (psig, barg, kPag, or _g after a unit: 3.2bar_g) is taken over the\n"
          "  barometer (-b), which is printed; other pressures are absolute\n"
          "  quantities of different kinds may come in any order; two of one kind keep theirs\n"
          "FLUID: a gas by formula or name (N2, \"carbon dioxide\") or a mixture\n"
          "  \"CO2=5%;N2=balance\" (';' or ',' between components)\n"
          "\noptions:\n",
          out);
    model_list(models, sizeof models, " | ");
    fprintf(out, "  -m, --model M        %s (default %s)\n", models, model_name(GKQ_DEFAULT_MODEL));
    fputs("  -r, --root R         stable | gas | liquid          (default stable)\n"
          "  -b, --barometer P    barometer for gauge readings (default 101.325kPa)\n"
          "  --barometer-end P    barometer at the end of a leak test (default: -b)\n"
          "  -R, --ref REF        reference condition: 0C 0C-100kPa 15C 20C 25C 60F or P@T\n"
          "                       (default 0C: 0 degC, 101.325 kPa)\n"
          "  --rh RH              relative humidity of the gas (45% or 0.45): state, contents,\n"
          "                       flow, leak\n"
          "  -u, --units LIST     display units (bar,degF,g/h); in batch also NAME=UNIT for\n"
          "                       the unit of a column (p=psig,T=F)\n"
          "  -k                   machine output: key=value pairs, keys carry their unit\n"
          "  -j                   machine output: one JSON object per line\n"
          "  -h, --help           this text; with a word, the word's help\n"
          "  -V, --version        versions\n"
          "\nexit status: 0 ok; 1 a calculation, an input or a write failed, or a batch row\n"
          "failed; 2 the command line is wrong. Results are engineering estimates from the\n"
          "model; follow pressure-equipment codes and gas suppliers' data (docs/safety.md).\n",
          out);
}

int word_help(FILE *out, const word *w) {
    fprintf(out, "usage: gkq [options] %s\n\n%s\n\nexamples:\n  %s\n  %s\n", w->usage, w->help,
            w->ex1, w->ex2);
    if (w->roles != NULL) {
        const role *ro;
        fputs("\nbatch columns:", out);
        for (ro = w->roles; ro->name != NULL; ro++) { fprintf(out, " %s", ro->name); }
        fputc('\n', out);
    }
    return finish_output(out);
}

static int run_help(const settings *set, int argc, char **argv) {
    const word *w;
    char hint[64];
    (void)set;
    if (argc == 0) {
        usage(stdout);
        return finish_output(stdout);
    }
    w = find_word(argv[0]);
    if (w == NULL) {
        word_suggest(argv[0], hint, sizeof hint);
        fprintf(stderr, "gkq help: '%.60s' is not a word%s; 'gkq help' lists them\n", argv[0],
                hint);
        return 2;
    }
    return word_help(stdout, w);
}

static int run_version(const settings *set, int argc, char **argv) {
    (void)set;
    (void)argv;
    if (argc > 0) {
        fprintf(stderr, "gkq version: takes no arguments\n");
        return 2;
    }
    /* gkq is built with the library it ships with: one version for both */
    printf("gkq %s (gaskit %s, %s build)\n", gk_version(), gk_version(),
           (gk_build_flags() & GK_BUILD_FLOAT) != 0u ? "float" : "double");
    return finish_output(stdout);
}

static int run_batch_word(const settings *set, int argc, char **argv) {
    const word *w;
    char hint[64];
    if (argc != 1) {
        fprintf(stderr,
                "gkq batch: takes one word (e.g. gkq batch state < rows.csv), got %d "
                "arguments\n",
                argc);
        return 2;
    }
    w = find_word(argv[0]);
    if (w == NULL || w->fn == NULL) {
        word_suggest(argv[0], hint, sizeof hint);
        fprintf(stderr, "gkq batch: '%.60s' is not a word that computes rows%s\n", argv[0], hint);
        return 2;
    }
    return run_batch(set, w);
}

/* ------------------------------------------------------------------ one word */

int run_word(const settings *set, const word *w, int argc, char **argv) {
    args a;
    record r;
    detail why;
    gk_status st;
    why.text[0] = '\0';
    st = collect_args(argc, argv, NULL, &a, &why);
    rec_init(&r, w->fields, word_nfields(w));
    if (st == GK_OK) { st = w->fn(set, &a, &r, &why); }
    if (st != GK_OK) {
        fprintf(stderr, "gkq %s: %s\n", w->name, why.text[0] ? why.text : plain_status(st));
        return 1;
    }
    errno = 0;
    if (set->format == OUT_TEXT && (w->flags & W_CONVERT) != 0u) {
        /* a float build carries about 7 significant digits: print no more */
        printf("%s = %.*g %s\n", r.s[0], (gk_build_flags() & GK_BUILD_FLOAT) != 0u ? 7 : 10, r.v[1],
               r.s[2]);
        if (r.set[3]) { printf("  (gauge over the barometer %.6g kPa)\n", r.v[3] / 1000.0); }
    } else {
        if (set->format == OUT_TEXT && (w->flags & W_MODEL) != 0u && r.has_served &&
            r.served != set->model) {
            printf("%s (%s: %s)\n", w->title, model_title(set->model), model_title(r.served));
        } else if (set->format == OUT_TEXT && (w->flags & W_MODEL) != 0u) {
            printf("%s (%s)\n", w->title, model_title(set->model));
        } else if (set->format == OUT_TEXT) {
            printf("%s\n", w->title);
        }
        rec_print(stdout, set, &r, w->name);
    }
    return finish_output(stdout);
}

/* ------------------------------------------------------------------ options */

/* Reads the value of an option given as "-x VALUE", "--long VALUE" or "--long=VALUE". */
static const char *option_value(int argc, char **argv, int *i, const char *shortname,
                                const char *longname, int *missing) {
    const char *a = argv[*i];
    size_t ln = strlen(longname);
    if ((shortname != NULL && strcmp(a, shortname) == 0) || strcmp(a, longname) == 0) {
        if (*i + 1 >= argc) {
            *missing = 1;
            return NULL;
        }
        (*i)++;
        return argv[*i];
    }
    if (strncmp(a, longname, ln) == 0 && a[ln] == '=') { return a + ln + 1; }
    return NULL;
}

static int is_option(const char *a) {
    return a[0] == '-' &&
           ((a[1] >= 'a' && a[1] <= 'z') || (a[1] >= 'A' && a[1] <= 'Z') || a[1] == '-');
}

static int fail_usage(const char *fmt, const char *arg) {
    fputs("gkq: ", stderr);
    fprintf(stderr, fmt, arg);
    fputs("\ngkq: try 'gkq help'\n", stderr);
    return 2;
}

static int read_barometer(const char *text, const char *opt, gk_pressure *out) {
    quantity q;
    detail why;
    gk_pressure b;
    if (parse_quantity(text, opt, &q, &why) != GK_OK || q.d != DIM_PRESSURE || q.gauge ||
        gk_pressure_from((gk_real)q.value, q.unit, &b) != GK_OK) {
        fprintf(stderr,
                "gkq: %s '%.60s': expected the barometer as an absolute pressure above 0 "
                "(e.g. 26.42inHg, 950hPa)\n",
                opt, text);
        return 0;
    }
    if (barometer_odd(b)) {
        fprintf(stderr,
                "gkq: warning: %s '%.60s' is %.6g kPa; barometers read 50-110 kPa "
                "wherever people work: is it a line or gauge reading?\n",
                opt, text, (double)b.pa / 1000.0);
    }
    *out = b;
    return 1;
}

/* -u: display units, and NAME=UNIT column units for batch. */
static int read_units(const char *list, settings *set) {
    char buf[GKQ_TEXT_MAX], hint[64];
    char *tok, *next;
    if (strlen(list) >= sizeof buf) {
        return fail_usage("--units '%.60s...': list too long", list);
    }
    copy_text(buf, sizeof buf, list);
    for (tok = buf; tok != NULL; tok = next) {
        char *eq;
        tunit u;
        next = strchr(tok, ',');
        if (next != NULL) { *next++ = '\0'; }
        eq = strchr(tok, '=');
        if (!unit_find(eq != NULL ? eq + 1 : tok, &u)) {
            unit_suggest(eq != NULL ? eq + 1 : tok, hint, sizeof hint);
            fprintf(stderr,
                    "gkq: --units: '%.40s' is not a unit gkq knows%s; 'gkq units' lists "
                    "them\n",
                    eq != NULL ? eq + 1 : tok, hint);
            return 2;
        }
        if (eq != NULL) {
            *eq = '\0';
            if (set->ncolunits >= GKQ_COLUNITS_MAX || strlen(tok) >= sizeof set->colunits[0].name) {
                return fail_usage("--units: too many or too long column names at '%.40s'", tok);
            }
            copy_text(set->colunits[set->ncolunits].name, sizeof set->colunits[0].name, tok);
            set->colunits[set->ncolunits++].unit = u;
            continue;
        }
        if (u.gauge || u.d == DIM_NUMBER || u.d == DIM_TIME) {
            return fail_usage("--units: '%.40s' cannot be a display unit (results are shown as "
                              "absolute pressures; for a gauge value use convert)",
                              tok);
        }
        if (set->nshow < GKQ_SHOW_MAX) { set->show[set->nshow++] = u; }
    }
    return 0;
}

/* A display unit at a named reference condition (sccm, SCFM) sets -R when -R is not given,
   and must agree with it when it is. */
static int reconcile_reference(settings *set) {
    size_t i;
    for (i = 0; i < set->nshow; i++) {
        const tunit *u = &set->show[i];
        const refcond *rc;
        gk_reference r;
        if (u->ref == 0) { continue; }
        rc = &gkq_refs[u->ref - 1];
        if (gk_reference_get(rc->id, &r) != GK_OK) { return 2; }
        if (!set->ref_given) {
            set->ref = r;
            set->ref_given = 1;
            copy_text(set->ref_name, sizeof set->ref_name, rc->name);
            copy_text(set->ref_what, sizeof set->ref_what, rc->what);
        } else if (fabs((double)r.p.pa - (double)set->ref.p.pa) > 1e-3 ||
                   fabs((double)r.t.k - (double)set->ref.t.k) > 1e-6) {
            fprintf(stderr,
                    "gkq: --units %s stands for %s, but -R is %s: use a plain unit (e.g. "
                    "mL/min) for flows at -R\n",
                    u->name, rc->what, set->ref_what);
            return 2;
        }
    }
    return 0;
}

static const char *const long_options[] = { "--model",  "--root",  "--barometer", "--barometer-end",
                                            "--ref",    "--units", "--rh",        "--help",
                                            "--version" };

static int unknown_option(const char *a) {
    size_t i, bestd = 99;
    const char *best = NULL;
    for (i = 0; i < GKQ_ARRAY_SIZE(long_options); i++) {
        size_t d = text_distance(a, long_options[i]);
        if (d < bestd) {
            bestd = d;
            best = long_options[i];
        }
    }
    if (best != NULL && bestd <= 3) {
        fprintf(stderr, "gkq: unknown option '%.60s' (did you mean '%s'?)\n", a, best);
    } else {
        fprintf(stderr, "gkq: unknown option '%.60s'\n", a);
    }
    fputs("gkq: try 'gkq help'\n", stderr);
    return 2;
}

/* Parses the options into set and collects the other arguments. Returns -1 to go on, else an
   exit status. */
static int parse_options(int argc, char **argv, settings *set, char **rest, int *nrest, int *help) {
    int i, missing = 0;
    const char *units_list = NULL, *ref_text = "0C";
    detail why;
    for (i = 1; i < argc; i++) {
        const char *a = argv[i], *v;
        if (!is_option(a)) {
            if (*nrest >= GKQ_CELLS_MAX + 2) {
                return fail_usage("too many arguments at '%.60s'", a);
            }
            rest[(*nrest)++] = argv[i];
            continue;
        }
        if (strcmp(a, "-k") == 0) {
            set->format = OUT_KV;
        } else if (strcmp(a, "-j") == 0) {
            set->format = OUT_JSON;
        } else if (strcmp(a, "-h") == 0 || strcmp(a, "--help") == 0) {
            *help = 1;
        } else if (strcmp(a, "-V") == 0 || strcmp(a, "--version") == 0) {
            return run_version(set, 0, NULL);
        } else if ((v = option_value(argc, argv, &i, "-m", "--model", &missing)) != NULL) {
            if (!parse_model(v, &set->model)) {
                char models[160];
                model_list(models, sizeof models, ", ");
                fprintf(stderr, "gkq: -m '%.60s': unknown model; expected one of %s\n", v, models);
                fputs("gkq: try 'gkq help'\n", stderr);
                return 2;
            }
        } else if ((v = option_value(argc, argv, &i, "-r", "--root", &missing)) != NULL) {
            if (!parse_root(v, &set->root)) {
                return fail_usage("-r '%.60s': unknown root; expected stable, gas or liquid", v);
            }
            set->root_given = 1;
        } else if ((v = option_value(argc, argv, &i, "-b", "--barometer", &missing)) != NULL) {
            if (!read_barometer(v, "-b", &set->baro)) { return 2; }
            set->baro_given = 1;
        } else if ((v = option_value(argc, argv, &i, NULL, "--barometer-end", &missing)) != NULL) {
            if (!read_barometer(v, "--barometer-end", &set->baro_end)) { return 2; }
            set->baro_end_given = 1;
        } else if ((v = option_value(argc, argv, &i, "-R", "--ref", &missing)) != NULL) {
            ref_text = v;
            set->ref_given = 1;
        } else if ((v = option_value(argc, argv, &i, "-u", "--units", &missing)) != NULL) {
            units_list = v;
        } else if ((v = option_value(argc, argv, &i, NULL, "--rh", &missing)) != NULL) {
            quantity q;
            if (parse_quantity(v, "--rh", &q, &why) != GK_OK ||
                fraction_of(&q, "relative humidity", &set->rh, &why) != GK_OK) {
                return fail_usage("%s", why.text);
            }
            set->has_rh = 1;
        } else if (missing) {
            return fail_usage("option '%.60s' needs a value", a);
        } else {
            return unknown_option(a);
        }
    }
    if (parse_reference(ref_text, set, &set->ref, set->ref_what, sizeof set->ref_what, &why) !=
        GK_OK) {
        return fail_usage("-R: %s", why.text);
    }
    copy_text(set->ref_name, sizeof set->ref_name, ref_text);
    if (units_list != NULL && read_units(units_list, set) != 0) { return 2; }
    if (reconcile_reference(set) != 0) { return 2; }
    return -1;
}

int main(int argc, char **argv) {
    settings set;
    char *rest[GKQ_CELLS_MAX + 2];
    int nrest = 0, help = 0, rc;
    const word *w;
    char hint[64];

    memset(&set, 0, sizeof set);
    set.model = GKQ_DEFAULT_MODEL;
    set.root = GK_ROOT_STABLE;
    set.baro.pa = GK_STANDARD_ATMOSPHERE_PA;
    set.baro_end = set.baro;
    set.format = OUT_TEXT;
    rc = parse_options(argc, argv, &set, rest, &nrest, &help);
    if (rc >= 0) { return rc; }
    if (!set.baro_end_given) { set.baro_end = set.baro; }
    if (nrest == 0) {
        if (help) {
            usage(stdout);
            return finish_output(stdout);
        }
        usage(stderr);
        return 2;
    }
    w = find_word(rest[0]);
    if (w == NULL) {
        word_suggest(rest[0], hint, sizeof hint);
        fprintf(stderr, "gkq: '%.60s' is not a word%s; 'gkq help' lists them\n", rest[0], hint);
        return 2;
    }
    if (help) { return word_help(stdout, w); }
    if (w->run != NULL) { return w->run(&set, nrest - 1, rest + 1); }
    return run_word(&set, w, nrest - 1, rest + 1);
}
