#!/usr/bin/env python3
"""Counts the EVA alarms of one driver run (frama-c -report-csv) and checks them against the
list of explained (false) alarms.

Usage: alarms.py report.csv explained.txt driver precision seconds
Prints one line: "<driver> <precision>: <n> unexplained, <m> explained (by kind ...) <s> s";
exits 1 if an alarm or a driver assertion is not proven and not explained. An entry of
explained.txt is "function | kind | property", where property is the text frama-c prints (the
line number is left out so the list survives edits around it); '#' starts a comment.
"""
import csv
import sys

report, explained_file, driver, precision, seconds = sys.argv[1:6]
explained = set()
for line in open(explained_file, encoding="utf-8"):
    line = line.split("#", 1)[0].strip()
    if line:
        explained.add(tuple(p.strip() for p in line.split("|", 2)))

unexplained, ok_explained, kinds = [], [], {}
with open(report, encoding="utf-8") as f:
    for row in csv.DictReader(f, delimiter="\t"):
        status = row["status"]
        if status in ("Valid", "Considered valid", "Dead", "Unreachable", "Valid but dead",
                      "Valid under hyp."):
            continue
        if row["directory"].startswith("FRAMAC_SHARE"):
            continue  # the libc model's own specifications (assigns/from), not alarms
        kind = row["property kind"]
        key = (row["function"], kind, " ".join(row["property"].split()))
        kinds[kind] = kinds.get(kind, 0) + 1
        where = "%s/%s:%s %s %s: %s (%s)" % (row["directory"], row["file"], row["line"], row["function"],
                                            kind, key[2], status)
        if key in explained or (key[0], key[1], "*") in explained:
            ok_explained.append(where)
        else:
            unexplained.append(where)
for w in unexplained:
    print("UNEXPLAINED alarm: " + w, file=sys.stderr)
by_kind = ", ".join("%s %d" % kv for kv in sorted(kinds.items())) or "none"
print("%s %s: %d unexplained, %d explained (by kind: %s) %s s"
      % (driver, precision, len(unexplained), len(ok_explained), by_kind, seconds))
sys.exit(1 if unexplained else 0)
