# Sourced by the scale benchmarks: reading the report of `/usr/bin/time -v -o FILE`.
# time_v_summary FILE prints "WALL_SECONDS MAX_RSS_KB CPU_SECONDS" (CPU: user + system).
time_v_summary() {
  awk -F': ' '/Elapsed \(wall clock\)/ {n=split($2,a,":"); t=0; for(i=1;i<=n;i++) t=t*60+a[i]; w=t}
              /User time|System time/ {c+=$2}
              /Maximum resident set size/ {kb=$2}
              END {print w, kb, c}' "$1"
}
