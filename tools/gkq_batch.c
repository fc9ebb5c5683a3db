/*
 * gkq_batch.c - batch mode: rows of a word's arguments on standard input, one result row per
 * input row on standard output (CSV, JSON lines with -j, key=value lines with -k).
 *
 * The first row that is neither blank nor a '#' comment may be a header: named columns in any
 * order ("gas,p,T" or "time;p_bar;T_degC;gas"), a unit in the name or set with --units
 * NAME=UNIT for bare numbers, and any column the word does not know passed through unchanged.
 * Without a header, each row holds the word's arguments as on the command line. Delimiters:
 * comma, semicolon or tab (the most frequent of them in the first row); a UTF-8 byte-order mark
 * before the first row is skipped. Every row gets a status; a bad row never stops the run.
 */
#include <ctype.h>
#include <errno.h>
#include <stdlib.h>
#include <string.h>

#include "gkq.h"

#define NO_ROLE (-1)

typedef struct column {
    char name[64];
    int role; /* index into the word's roles, or NO_ROLE: passed through */
    int has_unit;
    tunit unit;
} column;

typedef struct sheet {
    char delim;
    int header;
    size_t ncols;
    column col[GKQ_COLS_MAX];
} sheet;

/* Splits one line in place into at most max cells at delim. Quotes ("...", "" for a quote) let
   a cell hold the delimiter. Cells are trimmed of spaces. Returns the count, or -1 when the
   quotes are malformed or there are too many cells. */
static int split_cells(char *line, char delim, char **cells, int max) {
    int n = 0;
    char *p = line;
    for (;;) {
        char *start, *w;
        while (*p == ' ' || (*p == '\t' && delim != '\t')) { p++; }
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
            while (*p == ' ' || (*p == '\t' && delim != '\t')) { p++; }
            if (*p != delim && *p != '\0') { return -1; }
        } else {
            while (*p != delim && *p != '\0') { *w++ = *p++; }
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

/* The delimiter of a file: the most frequent of ',', ';' and TAB outside quotes in its first
   row (a tie goes to the comma). */
static char pick_delimiter(const char *line) {
    size_t comma = 0, semi = 0, tab = 0;
    int quoted = 0;
    for (; *line != '\0'; line++) {
        if (*line == '"') { quoted = !quoted; }
        if (quoted) { continue; }
        comma += *line == ',';
        semi += *line == ';';
        tab += *line == '\t';
    }
    if (tab > comma && tab >= semi) { return '\t'; }
    if (semi > comma) { return ';'; }
    return ',';
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

/* Does name equal one of the '|'-separated aliases (ASCII case ignored)? With a unit tag after
   the alias and '_' ("p_bar", "T_degC", "q_L_per_min"), *unit receives the unit. Returns 1 for
   a plain match, 2 for a match with a unit, 0 for none. */
static int match_role(const char *aliases, const char *name, tunit *unit) {
    const char *a = aliases;
    while (*a != '\0') {
        const char *bar = strchr(a, '|');
        size_t n = bar != NULL ? (size_t)(bar - a) : strlen(a), k;
        char alias[40], rest[64];
        if (n < sizeof alias) {
            memcpy(alias, a, n);
            alias[n] = '\0';
            if (same_ci(name, alias)) { return 1; }
            if (strlen(name) > n + 1 && name[n] == '_' && strlen(name + n + 1) < sizeof rest) {
                char head[40];
                memcpy(head, name, n);
                head[n] = '\0';
                k = same_ci(head, alias) ? n : 0;
                if (k == n) {
                    /* "L_per_min" -> "L/min" */
                    const char *s = name + n + 1;
                    size_t o = 0;
                    while (*s != '\0' && o + 1 < sizeof rest) {
                        if (strncmp(s, "_per_", 5) == 0) {
                            rest[o++] = '/';
                            s += 5;
                        } else {
                            rest[o++] = *s++;
                        }
                    }
                    rest[o] = '\0';
                    if (unit_find(rest, unit)) { return 2; }
                }
            }
        }
        a += n;
        if (*a == '|') { a++; }
    }
    return 0;
}

/* Maps a header cell to a role (an exact alias first, then an alias with a unit). */
static void map_column(const word *w, const settings *set, const char *name, column *c) {
    int i, pass;
    size_t k;
    copy_text(c->name, sizeof c->name, name);
    c->role = NO_ROLE;
    c->has_unit = 0;
    for (pass = 1; pass <= 2 && c->role == NO_ROLE; pass++) {
        for (i = 0; w->roles[i].name != NULL; i++) {
            tunit u;
            if (match_role(w->roles[i].name, name, &u) == pass) {
                c->role = i;
                if (pass == 2) {
                    c->has_unit = 1;
                    c->unit = u;
                }
                break;
            }
        }
    }
    for (k = 0; k < set->ncolunits; k++) {
        if (same_ci(set->colunits[k].name, name)) {
            c->has_unit = 1;
            c->unit = set->colunits[k].unit;
        }
    }
}

/* A first row is a header when one of its cells names a column of the word and none is a
   number. */
static int read_header(const word *w, const settings *set, char **cells, int n, sheet *sh) {
    int i, known = 0;
    for (i = 0; i < n; i++) {
        unsigned char c = (unsigned char)cells[i][0];
        if (isdigit(c) || c == '.' ||
            ((c == '-' || c == '+') && isdigit((unsigned char)cells[i][1]))) {
            return 0;
        }
    }
    for (i = 0; i < n; i++) {
        map_column(w, set, cells[i], &sh->col[i]);
        if (sh->col[i].role != NO_ROLE) { known = 1; }
    }
    if (!known) { return 0; }
    sh->ncols = (size_t)n;
    sh->header = 1;
    return 1;
}

static void print_head(const settings *set, const word *w, const sheet *sh) {
    record r;
    size_t i;
    char key[80];
    if (set->format != OUT_CSV) { return; }
    fputs("line,status,message", stdout);
    for (i = 0; i < sh->ncols; i++) {
        if (sh->col[i].role == NO_ROLE) {
            fputc(',', stdout);
            print_csv_text(stdout, sh->col[i].name);
        }
    }
    rec_init(&r, w->fields, word_nfields(w));
    for (i = 0; i < r.n; i++) {
        field_key(set, &r.f[i], key, sizeof key);
        printf(",%s", key);
    }
    fputc('\n', stdout);
}

/* One output row: line number, status, message, passed-through cells, the word's fields. */
static void print_row(const settings *set, const word *w, const sheet *sh, char **cells, int n,
                      long line, gk_status st, const char *msg, const record *r) {
    size_t i;
    if (set->format == OUT_CSV) {
        printf("%ld,%s,", line, status_token(st));
        print_csv_text(stdout, msg);
        for (i = 0; i < sh->ncols; i++) {
            if (sh->col[i].role != NO_ROLE) { continue; }
            fputc(',', stdout);
            if ((int)i < n) { print_csv_text(stdout, cells[i]); }
        }
        fputc(',', stdout);
        rec_print(stdout, set, r, NULL);
        fputc('\n', stdout);
        return;
    }
    if (set->format == OUT_JSON) {
        printf("{\"line\":%ld,\"status\":\"%s\",\"message\":", line, status_token(st));
        print_json_string(stdout, msg);
        for (i = 0; i < sh->ncols; i++) {
            if (sh->col[i].role != NO_ROLE) { continue; }
            fputc(',', stdout);
            print_json_string(stdout, sh->col[i].name);
            fputc(':', stdout);
            print_json_string(stdout, (int)i < n ? cells[i] : "");
        }
        rec_print(stdout, set, r, NULL);
        fputs("}\n", stdout);
        return;
    }
    printf("line=%ld status=%s message=", line, status_token(st));
    for (; *msg != '\0'; msg++) { fputc(*msg == ' ' ? '_' : *msg, stdout); }
    for (i = 0; i < sh->ncols; i++) {
        const char *s;
        if (sh->col[i].role != NO_ROLE) { continue; }
        printf(" %s=", sh->col[i].name);
        for (s = (int)i < n ? cells[i] : ""; *s != '\0'; s++) {
            fputc(*s == ' ' ? '_' : *s, stdout);
        }
    }
    rec_print(stdout, set, r, NULL);
    fputc('\n', stdout);
    (void)w;
}

/* A cell of a column into buf; a bare number in a column with a unit gets the unit appended. */
static char *with_unit(const column *c, const char *cell, char *buf, size_t cap) {
    unsigned char ch = (unsigned char)cell[0];
    char *end;
    copy_text(buf, cap, cell);
    if (!c->has_unit || cell[0] == '\0') { return buf; }
    if (!(isdigit(ch) || ch == '.' || ch == '-' || ch == '+')) { return buf; }
    (void)strtod(cell, &end);
    while (*end == ' ') { end++; }
    if (*end != '\0') { return buf; /* the cell carries its own unit */ }
    snprintf(buf, cap, "%s%s", cell, c->unit.name);
    return buf;
}

/* A per-row option from its column: relative humidity or a barometer. */
static gk_status row_option(const role *ro, const char *text, const char *where, settings *rs,
                            detail *why) {
    quantity q;
    gk_status st = parse_quantity(text, where, &q, why);
    if (st != GK_OK) { return st; }
    if (ro->special == ROLE_RH) {
        st = fraction_of(&q, "relative humidity", &rs->rh, why);
        rs->has_rh = st == GK_OK;
        return st;
    }
    if (q.d != DIM_PRESSURE || q.gauge) {
        blame(why, &q, "expected the barometer as an absolute pressure (e.g. 950hPa)");
        return GK_ERR_ARGUMENT;
    }
    if (ro->special == ROLE_BARO) {
        st = to_pressure(&q, rs->baro, &rs->baro, why);
        if (st == GK_OK && !rs->baro_end_given) { rs->baro_end = rs->baro; }
        return st;
    }
    rs->baro_end_given = 1;
    return to_pressure(&q, rs->baro_end, &rs->baro_end, why);
}

/* Computes one row of a file with a header. */
static gk_status header_row(const settings *set, const word *w, const sheet *sh, char **cells,
                            int n, record *r, detail *why) {
    char buf[GKQ_CELLS_MAX][GKQ_LINE_MAX / 4];
    char where[GKQ_CELLS_MAX][40];
    char *argv[GKQ_CELLS_MAX];
    const char *wh[GKQ_CELLS_MAX];
    settings rs = *set;
    int i, na = 0;
    size_t c;
    args a;
    gk_status st;
    if ((size_t)n > sh->ncols) {
        say(why, "the row has %d cells, the header %u", n, (unsigned)sh->ncols);
        return GK_ERR_PARSE;
    }
    for (i = 0; w->roles[i].name != NULL; i++) {
        for (c = 0; c < sh->ncols && (int)c < n; c++) {
            if (sh->col[c].role != i || cells[c][0] == '\0') { continue; }
            snprintf(where[na], sizeof where[0], "column %.30s", sh->col[c].name);
            if (w->roles[i].special != ROLE_ARG) {
                const char *t = with_unit(&sh->col[c], cells[c], buf[na], sizeof buf[0]);
                if ((st = row_option(&w->roles[i], t, where[na], &rs, why)) != GK_OK) { return st; }
                break;
            }
            if (w->roles[i].d != DIM_NONE && w->roles[i].d != DIM_NUMBER &&
                !(isdigit((unsigned char)cells[c][0]) || cells[c][0] == '.' || cells[c][0] == '-' ||
                  cells[c][0] == '+')) {
                say(why, "%s '%.60s': not a number; expected a %s", where[na], cells[c],
                    dim_name(w->roles[i].d));
                return GK_ERR_PARSE;
            }
            argv[na] = with_unit(&sh->col[c], cells[c], buf[na], sizeof buf[0]);
            wh[na] = where[na];
            na++;
            break;
        }
    }
    st = collect_args(na, argv, wh, &a, why);
    if (st == GK_OK) { st = w->fn(&rs, &a, r, why); }
    return st;
}

static gk_status plain_row(const settings *set, const word *w, char **cells, int n, record *r,
                           detail *why) {
    char where[GKQ_CELLS_MAX][40];
    const char *wh[GKQ_CELLS_MAX];
    args a;
    int i;
    gk_status st;
    if (n > GKQ_CELLS_MAX) {
        say(why, "%d cells: without a header row a row holds at most %d arguments", n,
            GKQ_CELLS_MAX);
        return GK_ERR_ARGUMENT;
    }
    for (i = 0; i < n; i++) {
        snprintf(where[i], sizeof where[0], "column %d", i + 1);
        wh[i] = where[i];
    }
    st = collect_args(n, cells, wh, &a, why);
    if (st == GK_OK) { st = w->fn(set, &a, r, why); }
    return st;
}

int run_batch(const settings *set_in, const word *w) {
    settings bs = *set_in;
    const settings *set = &bs;
    char line[GKQ_LINE_MAX + 1];
    long lineno = 0, rows = 0, failed = 0;
    sheet sh;
    record r;
    int first = 1;

    if (bs.format == OUT_TEXT) { bs.format = OUT_CSV; }
    memset(&sh, 0, sizeof sh);
    sh.delim = ',';
    for (;;) {
        char *cells[GKQ_COLS_MAX];
        int n, too_long, has_nul;
        detail why;
        gk_status st;
        char *text = line;
        long got = read_line(stdin, line, sizeof line, &too_long, &has_nul);
        size_t len, k;

        if (got < 0) { break; }
        len = (size_t)got;
        lineno++;
        if (lineno == 1 && len >= 3 && memcmp(line, "\xEF\xBB\xBF", 3) == 0) { text += 3; }
        if (len > 0 && line[len - 1] == '\r') { line[--len] = '\0'; }
        why.text[0] = '\0';
        rec_init(&r, w->fields, word_nfields(w));
        if (too_long || has_nul) {
            /* longer than GKQ_LINE_MAX or holding a NUL: reported in its row */
            if (first) {
                print_head(set, w, &sh);
                first = 0;
            }
            rows++;
            failed++;
            print_row(set, w, &sh, cells, 0, lineno, GK_ERR_PARSE,
                      too_long ? "line too long (over 1024 bytes)" : "NUL byte in line", &r);
            continue;
        }
        for (k = 0; text[k] == ' ' || text[k] == '\t'; k++) {}
        if (text[k] == '\0' || text[k] == '#') { continue; /* blank or comment */ }
        if (first) { sh.delim = pick_delimiter(text); }
        n = split_cells(text, sh.delim, cells, GKQ_COLS_MAX);
        if (first) {
            first = 0;
            if (n > 0 && read_header(w, set, cells, n, &sh)) {
                print_head(set, w, &sh);
                continue;
            }
            print_head(set, w, &sh);
        }
        rows++;
        if (n < 0) {
            st = GK_ERR_PARSE;
            say(&why, "malformed quotes or more than %d cells", GKQ_COLS_MAX);
            n = 0;
        } else if (sh.header) {
            st = header_row(set, w, &sh, cells, n, &r, &why);
        } else {
            st = plain_row(set, w, cells, n, &r, &why);
        }
        if (st != GK_OK) {
            failed++;
            rec_init(&r, w->fields, word_nfields(w));
            if (why.text[0] == '\0') { say(&why, "%s", plain_status(st)); }
        }
        print_row(set, w, &sh, cells, n, lineno, st, st == GK_OK ? "" : why.text, &r);
        if (ferror(stdout)) { break; }
    }
    if (first) { print_head(set, w, &sh); }
    if (output_failed(stdout)) {
        fprintf(stderr, "gkq batch %s: cannot write the output: %s\n", w->name,
                strerror(errno != 0 ? errno : EIO));
        return 1;
    }
    if (failed > 0) {
        fprintf(stderr, "gkq batch %s: %ld of %ld rows failed (see their status column)\n", w->name,
                failed, rows);
        return 1;
    }
    return 0;
}
