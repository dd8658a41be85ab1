#!/usr/bin/env bash
# Scale benchmark of `pumploss health` (issue 20): N readings (default 1 000 000) generated into a
# scratch folder, then in one run (PUMPLOSS_BENCH_REPEAT rounds, default 3, alternating; the
# fastest of each counts, as the least disturbed on a shared machine):
#   - `pumploss health` as a user runs it: the text report and the plot, no per-row files;
#   - `pumploss health --out`: besides, every row written to the readings and reasons CSV files;
#   - a pandas script that only reads the file and normalises the flow (writes nothing).
# Prints the seconds of each, the ratios to pandas, whether health is at least as fast, and the
# peak memory (max RSS, /usr/bin/time -v). The target compares like with like: health without
# per-row files against pandas, which writes none; the --out ratio is printed beside it.
# Usage: scripts/bench_health_scale.sh [pumploss binary] [N]
#   default binary: build/app/pumploss. Exit 1 when health is slower than pandas or its peak RSS
#   exceeds 200 MB and PUMPLOSS_BENCH_STRICT=1 (default: report only).
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
source "$here/scripts/time_v.sh"
bin="${1:-$here/build/app/pumploss}"
n="${2:-1000000}"
scratch="$(mktemp -d)"
trap 'rm -rf "$scratch"' EXIT
cp "$here/examples/demo/oil.toml" "$here/examples/demo/pump_p31_health.toml" "$scratch/"
/usr/bin/python3 "$here/bench/health_scale.py" generate "$n" "$scratch/readings.csv"
echo "readings: $n rows, $(du -h "$scratch/readings.csv" | cut -f1)"
run() {  # label, command...: prints the label, wall seconds, max RSS (kB) and CPU seconds
  local label="$1"; shift
  /usr/bin/time -v -o "$scratch/$label.time" "$@" >"$scratch/$label.out" 2>&1 || { cat "$scratch/$label.out"; exit 2; }
  echo "$label $(time_v_summary "$scratch/$label.time")"
}
hs=() hos=() ps=()
for _ in $(seq "${PUMPLOSS_BENCH_REPEAT:-3}"); do
  rm -rf "$scratch/out"
  hs+=("$(run health "$bin" health "$scratch/readings.csv" --pump "$scratch/pump_p31_health.toml")")
  hos+=("$(run health_out "$bin" health "$scratch/readings.csv" --pump "$scratch/pump_p31_health.toml" --out "$scratch/out")")
  ps+=("$(run pandas /usr/bin/python3 "$here/bench/health_scale.py" pandas "$scratch/readings.csv")")
done
echo "command: $bin health readings.csv --pump pump_p31_health.toml   (N = $n)"
echo "command: $bin health readings.csv --pump pump_p31_health.toml --out out"
echo "command: /usr/bin/python3 bench/health_scale.py pandas readings.csv"
echo "machine: $(nproc) cores, load average $(cut -d' ' -f1-3 /proc/loadavg 2>/dev/null || echo '?')"
/usr/bin/python3 - "$n" "$scratch/out/health_readings.csv" "${hs[@]}" -- "${hos[@]}" -- "${ps[@]}" <<'PY'
import os, sys
n, csv = int(sys.argv[1]), sys.argv[2]
args = sys.argv[3:]
c1 = args.index("--")
c2 = args.index("--", c1 + 1)
runs = lambda xs: [(float(x.split()[1]), int(x.split()[2]), float(x.split()[3])) for x in xs]
h, ho, p = runs(args[:c1]), runs(args[c1 + 1:c2]), runs(args[c2 + 1:])
best = lambda rs: (min(r[0] for r in rs), min(r[2] for r in rs), max(r[1] for r in rs))
(hs, hcpu, hkb), (hos, hocpu, hokb), (ps, pcpu, pkb) = best(h), best(ho), best(p)
rows = sum(1 for line in open(csv) if line and line[0].isdigit())
each = lambda rs, k: " ".join(f"{r[k]:.2f}" for r in rs)
line = lambda name, rs, s, c, kb: print(f"{name}: {s:.2f} s wall, {c:.2f} s CPU (fastest of {len(rs)}: wall "
                                        f"{each(rs, 0)}; CPU {each(rs, 2)}), peak RSS {kb / 1024:.0f} MB")
line("pumploss health (text report and plot)", h, hs, hcpu, hkb)
line("pumploss health --out (besides, every row into the CSV files)", ho, hos, hocpu, hokb)
print(f"  CSV rows {rows}")
line("pandas read + normalise (writes nothing)", p, ps, pcpu, pkb)
print(f"ratio health / pandas: {hs / ps:.2f} wall, {hcpu / pcpu:.2f} CPU (at most 1 asked, wall time)")
print(f"ratio health --out / pandas: {hos / ps:.2f} wall, {hocpu / pcpu:.2f} CPU (for information)")
for what, a, b in (("wall", hs, ps), ("CPU", hcpu, pcpu)):
    print(f"health at least as fast as pandas ({what}): " +
          ("yes" if a <= b else f"NO, {100 * (a / b - 1):.0f} % slower"))
ok = hs <= ps and max(hkb, hokb) <= 200 * 1024 and rows == n
print("figures reached (wall time, peak RSS under 200 MB, every row in the CSV)" if ok else "figures NOT reached")
sys.exit(1 if (not ok and os.environ.get("PUMPLOSS_BENCH_STRICT") == "1") else 0)
PY
