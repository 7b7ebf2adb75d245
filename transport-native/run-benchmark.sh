#!/usr/bin/env bash
# The native benchmark: a 2000-zone convection batch with the zone-major Jacobian, timed from C
# through libstartransport (src/bench/c/bench_convection.c) and from Java through the Java API
# (io.github.startransport.bridge.BatchTiming), on the same zones: the innermost 2000 zones of the
# demo star asked for 2050, with an invented nabla_mu, completed by the ideal-gas thermodynamics
# and the analytic opacity.
# The two alternate REPEATS times (default 3), so that load from other processes falls on both;
# each run warms up for WARMUP seconds (default 3), then times ROUNDS rounds (default 61) of CALLS
# calls (default 40). Prints every run's line and a summary: the fastest round of each side
# (the least disturbed by other processes) and the median of the runs' medians, with the
# crossing overhead bridge / Java - 1.
#
# On a shared machine run it under the build lock:  flock /tmp/build.lock bash transport-native/run-benchmark.sh
set -euo pipefail
root="$(cd "$(dirname "$0")/.." && pwd)"
native="$root/transport-native/target/native"
work="$root/transport-native/target/bench"
repeats="${REPEATS:-3}"
warmup="${WARMUP:-3}"
rounds="${ROUNDS:-61}"
calls="${CALLS:-40}"
if [ ! -f "$native/libstartransport.so" ]; then
  (cd "$root" && mvn -B -q -pl transport-native -am package -DskipTests) >&2
fi
mkdir -p "$work"
java -cp "$native/*" io.github.startransport.bridge.ExampleReference "$work" 2050 2000 > /dev/null
cc -std=c11 -O2 -I"$native/include" -I"$root/transport-native/src/examples/c" \
  "$root/transport-native/src/bench/c/bench_convection.c" -o "$work/bench_convection" \
  -L"$native" -lstartransport -Wl,-rpath,"$native"
echo "machine: $(nproc) cores, $(java -version 2>&1 | sed -n 2p), $(cc --version | head -1)"
: > "$work/runs.txt"
for i in $(seq "$repeats"); do
  "$work/bench_convection" "$work" "$warmup" "$rounds" "$calls" | tee -a "$work/runs.txt"
  java -cp "$native/*" io.github.startransport.bridge.BatchTiming "$work" "$warmup" "$rounds" "$calls" \
    | tee -a "$work/runs.txt"
done
awk '
  /^bridge:/                 { side = "bridge" }
  /^java: .*zone-major/      { side = "java" }
  /^java: .*column Jacobian/ { side = "columns" }
  /^java-buffer:/            { side = "buffer" }
  {
    match($0, /median [0-9.]+/); med = substr($0, RSTART + 7, RLENGTH - 7) + 0
    match($0, /fastest round [0-9.]+/); fast = substr($0, RSTART + 14, RLENGTH - 14) + 0
    n[side]++; m[side, n[side]] = med
    if (!(side in best) || fast < best[side]) best[side] = fast
  }
  function median(s,   i, j, t, k) {
    k = n[s]
    for (i = 1; i <= k; i++) a[i] = m[s, i]
    for (i = 1; i <= k; i++) for (j = i + 1; j <= k; j++) if (a[j] < a[i]) { t = a[i]; a[i] = a[j]; a[j] = t }
    return k % 2 ? a[(k + 1) / 2] : (a[k / 2] + a[k / 2 + 1]) / 2
  }
  END {
    printf "summary: fastest round: bridge %.1f ns per zone, Java %.1f (column layout %.1f): crossing overhead %+.1f %%\n", \
      best["bridge"], best["java"], best["columns"], 100 * (best["bridge"] / best["java"] - 1)
    printf "summary: median of %d runs: bridge %.1f ns per zone, Java %.1f (column layout %.1f): crossing overhead %+.1f %%\n", \
      n["bridge"], median("bridge"), median("java"), median("columns"), 100 * (median("bridge") / median("java") - 1)
    printf "summary: the Java kernel into a direct buffer, as the bridge calls it: fastest round %.1f, median %.1f ns per zone\n", \
      best["buffer"], median("buffer")
  }' "$work/runs.txt"
