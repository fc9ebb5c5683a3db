/*
 * gkq_output.c - output records and their formats: the readable report, key=value pairs, JSON
 * lines and CSV. Machine keys carry their unit ("p_Pa", "T_K", "p_bar" under -u bar); fields
 * without a dimension carry their fixed unit ("deviation_pct") or are plain numbers ("z").
 */
#include <errno.h>
#include <string.h>

#include "gkq.h"

void rec_init(record *r, const field *f, size_t n) {
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

void rec_real(record *r, const char *key, double v) {
    size_t i = rec_index(r, key);
    if (i < r->n) {
        r->set[i] = 1;
        r->v[i] = v;
    }
}

void rec_text(record *r, const char *key, const char *s) {
    size_t i = rec_index(r, key);
    if (i < r->n) {
        r->set[i] = 1;
        copy_text(r->s[i], sizeof r->s[i], s);
    }
}

/* A volume-flow field at the reference condition is marked by the fixed text "ref". */
static int is_ref_flow(const field *f) {
    return f->d == DIM_VOLUME_FLOW && strcmp(f->fixed, "ref") == 0;
}

/* The -u unit for a field (the last one given of its dimension), or NULL. A unit at a named
   reference condition (sccm) applies only to reference flows, a plain one only to the others. */
static const tunit * override(const settings *set, const field *f) {
    size_t i = set->nshow;
    while (i > 0) {
        const tunit *u = &set->show[--i];
        if (u->d != f->d) { continue; }
        if (f->d == DIM_VOLUME_FLOW && (u->ref != 0) != is_ref_flow(f)) { continue; }
        return u;
    }
    return NULL;
}

/* The unit a field is shown in: -u, else SI for machines, else its display default. */
static int shown_unit(const settings *set, const field *f, int machine, tunit *out) {
    const tunit *u = override(set, f);
    if (u != NULL) {
        *out = *u;
        return 1;
    }
    if (machine) {
        memset(out, 0, sizeof *out);
        out->name = gk_unit_symbol(si_unit(f->d));
        out->d = f->d;
        out->base = si_unit(f->d);
        out->mult = 1.0;
        return 1;
    }
    return unit_find(f->show, out);
}

void field_key(const settings *set, const field *f, char *buf, size_t cap) {
    char tag[48];
    tunit u;
    tag[0] = '\0';
    if (f->kind == F_REAL && f->d != DIM_NONE && shown_unit(set, f, 1, &u)) {
        unit_tag(u.name, tag, sizeof tag);
    } else if (f->kind == F_REAL && f->d == DIM_NONE && f->fixed[0] != '\0') {
        unit_tag(f->fixed, tag, sizeof tag);
    }
    if (tag[0] != '\0') {
        snprintf(buf, cap, "%s_%s", f->key, tag);
    } else {
        snprintf(buf, cap, "%s", f->key);
    }
}

/* The value of a real field in the unit of its key (machine) or of its display (people). */
static double field_value(const settings *set, const record *r, size_t i, int machine,
                          const char **unit) {
    const field *f = &r->f[i];
    tunit u;
    double shown;
    *unit = f->fixed;
    if (f->d == DIM_NONE) { return r->v[i]; }
    if (shown_unit(set, f, machine, &u) && si_to_shown(r->v[i], f->d, &u, &shown)) {
        *unit = u.name;
        return shown;
    }
    *unit = gk_unit_symbol(si_unit(f->d));
    return r->v[i];
}

void print_json_string(FILE *out, const char *s) {
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

void print_csv_text(FILE *out, const char *s) {
    if (strpbrk(s, ",;\t\"\n\r") == NULL) {
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

static void print_text(FILE *out, const settings *set, const record *r) {
    size_t i;
    for (i = 0; i < r->n; i++) {
        const field *f = &r->f[i];
        const char *unit;
        double v;
        if (!r->set[i]) { continue; }
        if (f->kind == F_TEXT) {
            fprintf(out, "  %-30s %s\n", f->label, r->s[i]);
            continue;
        }
        v = field_value(set, r, i, 0, &unit);
        fprintf(out, "  %-30s %.6g%s%s\n", f->label, v, unit[0] ? " " : "", unit);
    }
}

/* Prints a record. Text: one "label  value unit" line per set field. kv: "key=value" pairs on
   one line. JSON: one object per line. CSV: the fields' cells only (the batch adds the rest). */
void rec_print(FILE *out, const settings *set, const record *r, const char *wname) {
    size_t i;
    const char *unit;
    char key[80];
    if (set->format == OUT_TEXT) {
        print_text(out, set, r);
        return;
    }
    if (set->format == OUT_CSV) {
        for (i = 0; i < r->n; i++) {
            if (i > 0) { fputc(',', out); }
            if (!r->set[i]) { continue; }
            if (r->f[i].kind == F_TEXT) {
                print_csv_text(out, r->s[i]);
            } else {
                fprintf(out, "%.10g", field_value(set, r, i, 1, &unit));
            }
        }
        return;
    }
    if (set->format == OUT_JSON) {
        if (wname != NULL) {
            fputs("{\"word\":", out);
            print_json_string(out, wname);
        }
        for (i = 0; i < r->n; i++) {
            if (!r->set[i]) { continue; }
            field_key(set, &r->f[i], key, sizeof key);
            fputc(',', out);
            print_json_string(out, key);
            fputc(':', out);
            if (r->f[i].kind == F_TEXT) {
                print_json_string(out, r->s[i]);
            } else {
                fprintf(out, "%.10g", field_value(set, r, i, 1, &unit));
            }
        }
        if (wname != NULL) { fputs("}\n", out); }
        return;
    }
    if (wname != NULL) { fprintf(out, "word=%s", wname); }
    for (i = 0; i < r->n; i++) {
        if (!r->set[i]) { continue; }
        field_key(set, &r->f[i], key, sizeof key);
        fprintf(out, " %s=", key);
        if (r->f[i].kind == F_TEXT) {
            /* kv values never hold spaces: they are replaced by '_' */
            const char *s;
            for (s = r->s[i]; *s != '\0'; s++) { fputc((*s == ' ' || *s == '\t') ? '_' : *s, out); }
        } else {
            fprintf(out, "%.10g", field_value(set, r, i, 1, &unit));
        }
    }
    if (wname != NULL) { fputc('\n', out); }
}

/* Flushes and reports whether any write to out failed (a full disk, a closed pipe). */
int output_failed(FILE *out) { return fflush(out) != 0 || ferror(out) != 0; }

/* 0 when everything written to out arrived, else 1 with a message on stderr. */
int finish_output(FILE *out) {
    if (!output_failed(out)) { return 0; }
    fprintf(stderr, "gkq: cannot write the output: %s\n", strerror(errno != 0 ? errno : EIO));
    return 1;
}
