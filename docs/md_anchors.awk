# md_anchors.awk - Doxygen input filter for the Markdown pages in docs/ (see Doxyfile.in).
#
# The pages are written for plain Markdown viewers, where a link "[text](#some-heading)"
# reaches a heading by its automatic GitHub-style id. Doxygen 1.9 does not make such ids, so
# this filter gives every heading that a link in the same page targets an explicit
# "{#some-heading}" label. Only targeted headings get one (labels are global in Doxygen, so
# ids nobody links to are left alone), code blocks are not touched, and no line is added or
# removed, so Doxygen's line numbers stay right.  Usage: awk -f md_anchors.awk FILE
function slug(text,    s) {
    s = tolower(text)
    sub(/^#+[ \t]*/, "", s)
    sub(/[ \t]+$/, "", s)
    gsub(/[^a-z0-9 _-]/, "", s)
    gsub(/ /, "-", s)
    return s
}
BEGIN {
    file = ARGV[1]
    fence = 0
    while ((getline line < file) > 0) {
        if (line ~ /^[ \t]*(```|~~~)/) { fence = !fence; continue }
        if (fence) continue
        rest = line
        while (match(rest, /\]\(#[A-Za-z0-9_-]+\)/)) {
            target[substr(rest, RSTART + 3, RLENGTH - 4)] = 1
            rest = substr(rest, RSTART + RLENGTH)
        }
    }
    close(file)
    fence = 0
}
{
    if ($0 ~ /^[ \t]*(```|~~~)/) fence = !fence
    if (!fence && $0 ~ /^#+[ \t]/ && $0 !~ /\{#[^}]*\}[ \t]*$/) {
        id = slug($0)
        if (id in target) { print $0 " {#" id "}"; next }
    }
    print
}
