#!/bin/sh
# Regenerates the gkq outputs pasted in docs/guide.md, or (with --check) fails when one of them
# no longer matches what the program prints.
#
#   sh tools/tests/regen_guide.sh [--check] PATH_TO_GKQ
#
# In the guide, a pasted run is a line indented by four spaces that starts with "$ " and names
# gkq, followed by its output, indented by four spaces, up to the first line that is not so
# indented (or the next "$ " line). The command runs in /bin/sh with gkq first on PATH, in an
# empty scratch directory, standard error merged into standard output. The outputs are those of
# a double build (a float build prints other last digits).
set -eu
check=0
if [ "${1:-}" = "--check" ]; then check=1; shift; fi
[ $# -eq 1 ] || { echo "usage: $0 [--check] PATH_TO_GKQ" >&2; exit 2; }
gkq=$1
here=$(cd "$(dirname "$0")/../.." && pwd)
guide=$here/docs/guide.md
bindir=$(cd "$(dirname "$gkq")" && pwd)
case "$("$gkq" version)" in
    *"double build"*) ;;
    *) echo "$0: needs gkq of a double build, got: $("$gkq" version)" >&2; exit 2 ;;
esac
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT
mkdir "$tmp/run"
awk -v dir="$bindir" -v run="$tmp/run" '
    function sq(s) { gsub(/\047/, "\047\\\047\047", s); return "\047" s "\047" }
    /^    \$ / && /gkq/ {
        print
        cmd = substr($0, 7)
        full = "cd " sq(run) " && PATH=" sq(dir) ":\"$PATH\" && export PATH && { " cmd "\n} 2>&1"
        while ((full | getline line) > 0) { print "    " line }
        close(full)
        skipping = 1
        next
    }
    skipping && /^    / && !/^    \$ / { next }
    { skipping = 0; print }
' "$guide" >"$tmp/guide.md"
if [ "$check" -eq 1 ]; then
    if ! diff -u "$guide" "$tmp/guide.md" >"$tmp/diff"; then
        cat "$tmp/diff"
        echo "docs/guide.md: the pasted gkq outputs above are stale; run: sh tools/tests/regen_guide.sh $gkq" >&2
        exit 1
    fi
    echo "docs/guide.md: $(grep -c '^    \$ .*gkq' "$guide") pasted gkq runs match the program"
else
    cp "$tmp/guide.md" "$guide"
    echo "docs/guide.md: $(grep -c '^    \$ .*gkq' "$guide") pasted gkq runs regenerated"
fi
