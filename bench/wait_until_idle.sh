#!/usr/bin/env bash
# Waits until the machine has been at least 90 % idle for three seconds in a row (from
# /proc/stat, all CPUs), so that a benchmark started next does not share the cores with a build.
# Usage: bench/wait_until_idle.sh && bench/export/export_quote_bench.sh build/lead 10
set -euo pipefail
idle_seconds=0
cpu_times() { read -r _ user nice system idle iowait irq softirq steal _ < /proc/stat
              echo "$((user + nice + system + idle + iowait + irq + softirq + steal)) $((idle + iowait))"; }
while [ "$idle_seconds" -lt 3 ]; do
  read -r total1 idle1 <<< "$(cpu_times)"
  sleep 1
  read -r total2 idle2 <<< "$(cpu_times)"
  if [ $(( (idle2 - idle1) * 100 / (total2 - total1) )) -ge 90 ]; then idle_seconds=$((idle_seconds + 1)); else idle_seconds=0; fi
done
