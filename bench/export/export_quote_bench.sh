#!/usr/bin/env bash
# Export benchmark: a 2,000-line quote written by Mendwright (libxlsxwriter) against
# python3-openpyxl writing the same cells, each as one whole process under /usr/bin/time -v.
# Not a unit test; results go to docs/benchmarks.md by hand.
#
# Usage: bench/export/export_quote_bench.sh BUILD_DIR [RUNS]
#   BUILD_DIR holds tests/export/export_sample_quote (build it first:
#   cmake --build BUILD_DIR --target export_sample_quote). RUNS (runs per timed block) defaults to 5.
set -euo pipefail
build=${1:?usage: export_quote_bench.sh BUILD_DIR [RUNS]}
runs=${2:-5}
here=$(cd "$(dirname "$0")" && pwd)
tool="$build/tests/export/export_sample_quote"
work=$(mktemp -d /tmp/mendwright-bench-XXXXXX)
trap 'rm -rf "$work"' EXIT
py=/usr/bin/python3   # Debian's interpreter with python3-openpyxl

# What both sides write: the cells of the 2,000-line quote (the cell list is made once, untimed).
"$tool" --out "$work" --name cells-source --lines 2000 --no-figures
"$py" "$here/dump_workbook_cells.py" "$work/cells-source.xlsx" "$work/cells.json"
cell_count=$("$py" -c "import json,sys; print(sum(len(s['cells']) for s in json.load(open(sys.argv[1]))))" "$work/cells.json")

# Timing: each side runs as a block of RUNS back-to-back processes under /usr/bin/time (so the
# 10 ms granularity of its CPU figures is spread over RUNS runs); blocks alternate between the
# sides, BLOCKS times, and the median block is reported per run. Peak memory comes from one more
# run of each side under /usr/bin/time -v.
blocks=3
block() {  # prints "wall_ms cpu_ms" per run, averaged over one block of RUNS runs
  /usr/bin/time -f '%e %U %S' -o "$work/block.txt" bash -c "for i in \$(seq $runs); do \"\$@\" > /dev/null; done" block "$@"
  awk -v n="$runs" '{printf "%.1f %.1f\n", $1 * 1000 / n, ($2 + $3) * 1000 / n}' "$work/block.txt"
}
peak_kb() {
  /usr/bin/time -v "$@" 2> "$work/time.txt" > /dev/null
  grep "Maximum resident set size" "$work/time.txt" | awk '{print $NF}'
}
median() { sort -n | awk '{a[NR]=$1} END {print a[int((NR+1)/2)]}'; }

ours=("$tool" --out "$work" --name ours --lines 2000 --no-figures)
theirs=("$py" "$here/openpyxl_write_cells.py" "$work/cells.json" "$work/theirs.xlsx")
: > "$work/ours.txt"; : > "$work/theirs.txt"
echo "load before: $(uptime)"
for b in $(seq "$blocks"); do
  block "${ours[@]}" >> "$work/ours.txt"
  block "${theirs[@]}" >> "$work/theirs.txt"
done
echo "load after:  $(uptime)"
echo "blocks, ours (wall cpu):   $(tr "\n" ";" < "$work/ours.txt")"; echo "blocks, openpyxl (wall cpu): $(tr "\n" ";" < "$work/theirs.txt")"
ours_s=$(cut -d' ' -f1 "$work/ours.txt" | median); ours_cpu=$(cut -d' ' -f2 "$work/ours.txt" | median)
theirs_s=$(cut -d' ' -f1 "$work/theirs.txt" | median); theirs_cpu=$(cut -d' ' -f2 "$work/theirs.txt" | median)
ours_kb=$(peak_kb "${ours[@]}"); theirs_kb=$(peak_kb "${theirs[@]}")
echo "cells written: $cell_count (2,000 quote lines, 4 sheets); $blocks blocks of $runs runs per side, median block, per run"
echo "mendwright export (pricing + libxlsxwriter): ${ours_s} ms wall, ${ours_cpu} ms CPU, peak RSS $((ours_kb / 1024)) MB (${ours_kb} kB)"
echo "python3-openpyxl, same cells:               ${theirs_s} ms wall, ${theirs_cpu} ms CPU, peak RSS $((theirs_kb / 1024)) MB (${theirs_kb} kB)"
"$py" -c "import sys; a=[float(x) for x in sys.argv[1:]]; print(f'speed-up: wall {a[1]/a[0]:.1f}x, CPU {a[3]/a[2]:.1f}x')" "$ours_s" "$theirs_s" "$ours_cpu" "$theirs_cpu"
