#!/bin/sh
# Remedies benchmark: the whole `options` and `plans` commands, with full re-verification, on
# invented synthetic surveys of 50 boards x 24 circuits and 50 boards x 48 circuits.
#   bench/remedies/run_bench.sh BUILD_DIR [PRICEBOOK_DIR]
# Prints, for each command and size, the best of 5 runs of elapsed and CPU (user + sys) seconds
# and the peak memory, measured with /usr/bin/time -v.
set -eu
build=${1:?usage: run_bench.sh BUILD_DIR [PRICEBOOK_DIR]}
here=$(cd "$(dirname "$0")" && pwd)
pricebook=${2:-$here/../../pricebook-demo}
cli=$build/app/cli/mendwright-cli
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
for circuits in 24 48; do
    /usr/bin/python3 "$here/make_survey.py" 50 "$circuits" > "$work/survey-$circuits.json"
done
printf '%-8s %-8s %10s %10s %10s\n' command survey elapsed_s cpu_s max_rss_kb
for command in options plans; do
    for circuits in 24 48; do
        best_elapsed=999; best_cpu=999; rss=0
        for run in 1 2 3 4 5; do
            /usr/bin/time -v "$cli" "$command" "$work/survey-$circuits.json" --pricebook "$pricebook" --json \
                > /dev/null 2> "$work/time.txt"
            elapsed=$(awk -F': ' '/Elapsed \(wall clock\)/ {n = split($2, p, ":"); s = 0; for (i = 1; i <= n; i++) s = s * 60 + p[i]; print s}' "$work/time.txt")
            cpu=$(awk -F': ' '/User time/ {u = $2} /System time/ {s = $2} END {print u + s}' "$work/time.txt")
            rss=$(awk -F': ' '/Maximum resident/ {print $2}' "$work/time.txt")
            best_elapsed=$(awk -v a="$best_elapsed" -v b="$elapsed" 'BEGIN {print (b < a) ? b : a}')
            best_cpu=$(awk -v a="$best_cpu" -v b="$cpu" 'BEGIN {print (b < a) ? b : a}')
        done
        printf '%-8s 50x%-5s %10s %10s %10s\n' "$command" "$circuits" "$best_elapsed" "$best_cpu" "$rss"
    done
done
