#!/usr/bin/env bash
# Side-by-side timing of the exact 3-component blend search against the numpy reference
# (../shared/bench/ternary_ref.py), in one run on the same machine. Usage:
#   bash docs/tools/blend-vs-numpy.sh [LIBRARY_SIZE] [ROUNDS]
# Needs target/cohesa.jar (mvn -B -o -DskipTests package) and python3 with numpy.
set -euo pipefail
N="${1:-250}"
ROUNDS="${2:-5}"
HERE="$(cd "$(dirname "$0")/../.." && pwd)"
REF="${COHESA_NUMPY_REF:-$HERE/../shared/bench/ternary_ref.py}"
PY="${PYTHON:-python3}"
[ -f "$HERE/target/cohesa.jar" ] || { echo "error: build first: mvn -B -o -DskipTests package" >&2; exit 2; }
[ -f "$REF" ] || { echo "error: numpy reference not found at $REF (set COHESA_NUMPY_REF)" >&2; exit 2; }
"$PY" -c "import numpy" 2>/dev/null || { echo "error: $PY has no numpy" >&2; exit 2; }
echo "machine: $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | xargs), load $(cut -d' ' -f1-3 /proc/loadavg)"
java_s=(); py_search=(); py_total=()
for r in $(seq 1 "$ROUNDS"); do
  j=$(java -jar "$HERE/target/cohesa.jar" bench blend --library-size "$N" --components 3 --top 50 --runs 5 --warmup 3 --json \
      | "$PY" -c "import json,sys; print(json.load(sys.stdin)['seconds_median'])")
  line=$("$PY" "$REF" "$N")
  s=$(echo "$line" | sed -E 's/.*search=([0-9.]+)s.*/\1/')
  e=$(echo "$line" | sed -E 's/.*enumerate=([0-9.]+)s.*/\1/')
  java_s+=("$j"); py_search+=("$s"); py_total+=("$(echo "$s + $e" | bc -l)")
  echo "round $r: cohesa median ${j}s | numpy search ${s}s (+ enumerate ${e}s)"
done
"$PY" - "${java_s[*]}" "${py_search[*]}" "${py_total[*]}" <<'PYEOF'
import statistics, sys
j = [float(x) for x in sys.argv[1].split()]
s = [float(x) for x in sys.argv[2].split()]
t = [float(x) for x in sys.argv[3].split()]
mj, ms, mt = statistics.median(j), statistics.median(s), statistics.median(t)
print(f"median cohesa {mj:.3f}s, numpy search {ms:.3f}s (with enumeration {mt:.3f}s)")
print(f"speed-up: {ms/mj:.1f}x over the numpy search alone, {mt/mj:.1f}x over numpy search + enumeration")
PYEOF
