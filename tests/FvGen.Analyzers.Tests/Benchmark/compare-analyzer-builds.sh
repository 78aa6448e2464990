#!/usr/bin/env bash
# Runs the compiler of a benchmark project (made by run-analyzer-benchmark.sh) directly, R times for
# each analyzer DLL given, interleaved, and prints the medians of the compiler's CPU time and of the
# analyzer time it reports. MSBuild's own time is left out and the versions are interleaved, so they
# see the same state of the machine: the way to compare two versions of the analyzer (`none` runs the
# compiler without it). The reported time still varies by about ±10 % between runs.
# Speed is never asserted in tests. Usage:
#   tests/FvGen.Analyzers.Tests/Benchmark/compare-analyzer-builds.sh WORK-DIR R DLL-or-none [DLL-or-none ...]
set -euo pipefail
WORK="$1"; R="$2"; shift 2
LOG="$WORK/build-true.log"
[ -f "$LOG" ] || { echo "no $LOG: run run-analyzer-benchmark.sh with that work dir first" >&2; exit 2; }
# The compiler's command line of the benchmark project, from the detailed build log.
LINE=$(grep -E "^\s+\S+/Roslyn/bincore/csc .*Kernels/K0\.cs" "$LOG" | tail -1 | sed 's/^ *//')
[ -n "$LINE" ] || { echo "no compiler command line in $LOG" >&2; exit 2; }
CSC="${LINE%% *}"
DLLS=()
for dll in "$@"; do
  if [ "$dll" = none ]; then DLLS+=(none); else
    [ -f "$dll" ] || { echo "no such analyzer DLL: $dll" >&2; exit 2; }
    # The compiler reports an analyzer under its assembly name; a renamed copy does not load beside it.
    [ "$(basename "$dll")" = FvGen.Analyzers.dll ] || { echo "$dll: name each version FvGen.Analyzers.dll, in a directory of its own" >&2; exit 2; }
    DLLS+=("$(cd "$(dirname "$dll")" && pwd)/$(basename "$dll")")
  fi
done
RESULTS=$(mktemp)
cd "$WORK"
for ((r = 1; r <= R; r++)); do
  for dll in "${DLLS[@]}"; do
    if [ "$dll" = none ]; then
      echo "${LINE#* }" | sed -E 's#/analyzer:[^ ]*FvGen\.Analyzers\.dll##' > compare.rsp
    else
      echo "${LINE#* }" | sed -E "s#/analyzer:[^ ]*FvGen\.Analyzers\.dll#/analyzer:$dll#" > compare.rsp
    fi
    out=$(/usr/bin/time -f "cpu %U %S" "$CSC" @compare.rsp 2>&1)
    cpu=$(echo "$out" | awk '/^cpu / { print $2 + $3 }')
    reported=$(echo "$out" | grep -E "^\s+[<0-9.]+\s+[<0-9]+\s+FvGen\.Analyzers, Version" | awk '{ print $1 }' || true)
    if [ "$dll" != none ] && [ -z "$reported" ]; then
      echo "the compiler reported no FvGen analyzer time with $dll (was it loaded?); its output:" >&2
      echo "$out" | tail -20 >&2
      exit 1
    fi
    echo "$dll $cpu ${reported:-0}" >> "$RESULTS"
    echo "run $r, $dll: compiler CPU ${cpu} s, FvGen analyzer time ${reported:--} s"
  done
done
median() { sort -g | awk '{ v[NR] = $1 } END { print (NR % 2) ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2 }'; }
echo "--- medians of $R runs, $(nproc) cores ---"
for dll in "${DLLS[@]}"; do
  echo "$dll: compiler CPU $(awk -v d="$dll" '$1 == d { print $2 }' "$RESULTS" | median) s, FvGen analyzer time $(awk -v d="$dll" '$1 == d { print $3 }' "$RESULTS" | median) s"
done
rm -f "$RESULTS"
