#!/usr/bin/env python3
"""Sorts the MISRA C:2012 findings of cppcheck's misra addon against gaskit's deviation record.

Usage: check.py rule-categories.txt deviations.txt docs/misra-deviations.md seconds findings...

findings: files of lines "FILE:LINE:COLUMN: misra-c2012-R.N" (cppcheck --template), one per
precision; a finding reported in both precisions counts once. deviations.txt: one permit per
line, "ID RULE SCOPE..." (SCOPE: fnmatch patterns of file paths; '#' starts a comment). A permit
for a Required or Mandatory rule must carry the word "not-applicable" or "checker-false-positive"
after its scope, and the record must say why. Every ID must head a section ("### ID ...") of
the record and every such section must have a permit, so record and stage cannot drift.
Prints one line "summary: ..." and exits 1 on any finding no permit covers, or on a mismatch.
"""
import fnmatch
import re
import sys

cat_file, dev_file, record_file, seconds = sys.argv[1:5]
finding_files = sys.argv[5:]

category = {}
rule = None
for line in open(cat_file, encoding="utf-8"):
    m = re.match(r"^Rule (\d+\.\d+) (Required|Advisory|Mandatory)$", line.strip())
    if m:
        category[m.group(1)] = m.group(2)

permits = []  # (id, rule, patterns, kind)
for line in open(dev_file, encoding="utf-8"):
    line = line.split("#", 1)[0].split()
    if not line:
        continue
    pid, prule, rest = line[0], line[1], line[2:]
    kind = "deviation"
    if rest and rest[-1] in ("not-applicable", "checker-false-positive"):
        kind = rest.pop()
    permits.append((pid, prule, rest, kind))

status = 0
record = open(record_file, encoding="utf-8").read()
record_ids = set(re.findall(r"^### (D\d+|F\d+)\b", record, re.M))
permit_ids = {p[0] for p in permits}
for pid in sorted(permit_ids - record_ids):
    print("ERROR: permit %s of %s has no section in %s" % (pid, dev_file, record_file))
    status = 1
for pid in sorted(record_ids - permit_ids):
    print("ERROR: section %s of %s has no permit in %s" % (pid, record_file, dev_file))
    status = 1
for pid, prule, _, kind in permits:
    if category.get(prule, "Required") != "Advisory" and kind == "deviation":
        print("ERROR: permit %s deviates %s rule %s: only Advisory rules are deviated"
              % (pid, category.get(prule, "?"), prule))
        status = 1

findings = set()
for f in finding_files:
    for line in open(f, encoding="utf-8", errors="replace"):
        m = re.match(r"^(.+?):(\d+):(\d+): misra-c2012-(\d+\.\d+)\b", line.strip())
        if m:
            findings.add((m.group(1), int(m.group(2)), m.group(4)))

open_by_rule, permitted_by_rule, used = {}, {}, {}
for path, line, r in sorted(findings):
    hit = None
    for pid, prule, pats, _ in permits:
        if prule == r and any(fnmatch.fnmatch(path, p) for p in pats):
            hit = pid
            break
    if hit:
        permitted_by_rule[r] = permitted_by_rule.get(r, 0) + 1
        used[hit] = used.get(hit, 0) + 1
    else:
        open_by_rule[r] = open_by_rule.get(r, 0) + 1
        print("FINDING %s:%d: MISRA C:2012 rule %s (%s)" % (path, line, r, category.get(r, "?")))
        status = 1


def by_rule(d):
    def key(r):
        return tuple(int(x) for x in r.split("."))
    return ", ".join("%s %d" % (r, d[r]) for r in sorted(d, key=key)) or "none"


req = sum(n for r, n in open_by_rule.items() if category.get(r) != "Advisory")
adv = sum(n for r, n in open_by_rule.items() if category.get(r) == "Advisory")
unused = sorted(permit_ids - set(used))
print("summary: misra: %d findings (Required/Mandatory %d, Advisory %d) by rule: %s; "
      "%d permitted by %d record entries (%s); %s s"
      % (req + adv, req, adv, by_rule(open_by_rule), sum(permitted_by_rule.values()),
         len(permit_ids), by_rule(permitted_by_rule), seconds))
if unused:
    print("summary: misra: record entries with no finding now (could be dropped): " + ", ".join(unused))
sys.exit(status)
