#!/bin/sh
# Remedies benchmark: the whole `options` and `plans` commands, with full re-verification, on
# invented synthetic surveys of 50 boards x 24 circuits and 50 boards x 48 circuits.
#   bench/remedies/run_bench.sh BUILD_DIR [PRICEBOOK_DIR] [RUNS]
# Prints the machine's load (uptime) and, for each command and size, the best and the median of
# RUNS runs (default 5) of elapsed (wall) and CPU (user + sys) seconds and the peak memory,
# measured with /usr/bin/time -v; then the 50 x 48 / 50 x 24 ratio of the best times.
set -eu
build=${1:?usage: run_bench.sh BUILD_DIR [PRICEBOOK_DIR] [RUNS]}
here=$(cd "$(dirname "$0")" && pwd)
pricebook=${2:-$here/../../pricebook-demo}
runs=${3:-5}
cli=$build/app/cli/mendwright-cli
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
for circuits in 24 48; do
    /usr/bin/python3 "$here/make_survey.py" 50 "$circuits" > "$work/survey-$circuits.json"
done
echo "load: $(uptime)"
printf '%-8s %-8s %12s %12s %10s %10s %10s\n' command survey best_wall_s median_wall best_cpu_s median_cpu max_rss_kb
for command in options plans; do
    for circuits in 24 48; do
        : > "$work/runs.txt"
        rss=0
        run=1
        while [ "$run" -le "$runs" ]; do
            /usr/bin/time -v "$cli" "$command" "$work/survey-$circuits.json" --pricebook "$pricebook" --json \
                > /dev/null 2> "$work/time.txt"
            elapsed=$(awk -F': ' '/Elapsed \(wall clock\)/ {n = split($2, p, ":"); s = 0; for (i = 1; i <= n; i++) s = s * 60 + p[i]; print s}' "$work/time.txt")
            cpu=$(awk -F': ' '/User time/ {u = $2} /System time/ {s = $2} END {print u + s}' "$work/time.txt")
            this_rss=$(awk -F': ' '/Maximum resident/ {print $2}' "$work/time.txt")
            [ "$this_rss" -gt "$rss" ] && rss=$this_rss
            echo "$elapsed $cpu" >> "$work/runs.txt"
            run=$((run + 1))
        done
        line=$(awk '{w[NR] = $1; c[NR] = $2}
            END {
                n = NR
                for (i = 1; i <= n; i++) for (j = i + 1; j <= n; j++) { if (w[j] < w[i]) { t = w[i]; w[i] = w[j]; w[j] = t } if (c[j] < c[i]) { t = c[i]; c[i] = c[j]; c[j] = t } }
                m = int((n + 1) / 2)
                printf "%s %s %s %s", w[1], w[m], c[1], c[m]
            }' "$work/runs.txt")
        set -- $line
        printf '%-8s 50x%-5s %12s %12s %10s %10s %10s\n' "$command" "$circuits" "$1" "$2" "$3" "$4" "$rss"
        echo "$command $circuits $1 $3" >> "$work/best.txt"
    done
done
awk '{wall[$1 " " $2] = $3; cpu[$1 " " $2] = $4}
    END {
        for (c = 1; c <= 2; c++) {
            name = (c == 1) ? "options" : "plans"
            w24 = wall[name " 24"]; w48 = wall[name " 48"]; c24 = cpu[name " 24"]; c48 = cpu[name " 48"]
            printf "%s: 50x48 / 50x24 = %.2f wall, %.2f CPU (best runs)\n", name, (w24 > 0 ? w48 / w24 : 0), (c24 > 0 ? c48 / c24 : 0)
        }
    }' "$work/best.txt"
