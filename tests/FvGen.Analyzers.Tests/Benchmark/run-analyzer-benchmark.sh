#!/usr/bin/env bash
# Builds a generated project of N kernels (copies of the corpus, each in its own namespace, every one
# in scope) R times without and R times with the FvGen analyzers, alternating, and prints each build's
# wall time, the compiler's own analyzer timing (-p:ReportAnalyzer=true) and the medians with ratios.
# The analyzers are referenced as a built DLL, the way the package delivers them, so the build with
# them does not also pay for building the analyzer project. Not part of the test run: speed is never
# asserted. Usage at the end of these notes.
# what: fvgen (default) measures the FvGen analyzers as a project gets them (build/FvGen.Analyzers.targets:
# the precompiled image where MSBuild runs on .NET, see analyzers/FvGen.Analyzers/Precompile.targets);
# il measures the IL DLL alone (what the .NET Framework MSBuild of Visual Studio loads); floor measures
# an analyzer that registers the same actions and only walks the operations (what asking for
# operation trees costs).
# compiler: fresh (default) starts a new compiler process for every build (UseSharedCompilation=false,
# what this machine's environment sets), so the analyzers are loaded and JIT-compiled in every build;
# server uses the SDK's shared compiler server (the SDK's own default and what an IDE's long-lived
# process resembles): the server and the analyzers in it are warmed by three builds each way first,
# and the server is shut down at the end.
# Usage: tests/FvGen.Analyzers.Tests/Benchmark/run-analyzer-benchmark.sh [N] [R] [work-dir] [what] [compiler]
set -euo pipefail
N="${1:-500}"
R="${2:-3}"
REPO="$(cd "$(dirname "$0")/../../.." && pwd)"
WORK="${3:-$(mktemp -d)}"
WHAT="${4:-fvgen}"
COMPILER="${5:-fresh}"
case "$COMPILER" in
  fresh) SHARED=false ;;
  server) SHARED=true; trap 'dotnet build-server shutdown > /dev/null 2>&1 || true' EXIT ;;
  *) echo "unknown compiler mode: $COMPILER (fresh or server)" >&2; exit 2 ;;
esac
CORPUS="$REPO/tests/FvGen.Analyzers.Tests/Corpus"
mkdir -p "$WORK/Kernels"
mapfile -t FILES < <(ls "$CORPUS"/*.cs | sort)
for ((k = 0; k < N; k++)); do
  src="${FILES[$((k % ${#FILES[@]}))]}"
  # File-scoped namespace after the usings keeps the copies' types apart.
  awk -v ns="Bench.K$k" '
    /^using / { print; last = NR; next }
    { if (!done && last && NR > last) { print "namespace " ns ";"; done = 1 } print }
  ' "$src" > "$WORK/Kernels/K$k.cs"
done
dotnet build "$REPO/analyzers/FvGen.Analyzers/FvGen.Analyzers.csproj" -c Release > /dev/null
ANALYZER="$REPO/analyzers/FvGen.Analyzers/bin/Release/netstandard2.0/FvGen.Analyzers.dll"
NAME="FvGen.Analyzers"
USE_IMAGE=true
case "$WHAT" in
  fvgen) ;;
  floor)
    dotnet build "$REPO/benchmarks/FvGen.Benchmarks.AnalyzerFloor/FvGen.Benchmarks.AnalyzerFloor.csproj" -c Release > /dev/null
    ANALYZER="$REPO/benchmarks/FvGen.Benchmarks.AnalyzerFloor/bin/Release/netstandard2.0/FvGen.Benchmarks.AnalyzerFloor.dll"
    NAME="FvGen.Benchmarks.AnalyzerFloor"
    ;;
  il) USE_IMAGE=false ;;
  *) echo "unknown analyzer to measure: $WHAT (fvgen, il or floor)" >&2; exit 2 ;;
esac
echo "measuring $ANALYZER"
cat > "$WORK/Bench.csproj" <<XML
<Project Sdk="Microsoft.NET.Sdk">
  <PropertyGroup>
    <TargetFramework>net10.0</TargetFramework>
    <Nullable>disable</Nullable>
    <AllowUnsafeBlocks>true</AllowUnsafeBlocks>
    <TreatWarningsAsErrors>false</TreatWarningsAsErrors>
    <NoWarn>\$(NoWarn);CS0169;CS0649;CS8618</NoWarn>
    <ManagePackageVersionsCentrally>false</ManagePackageVersionsCentrally>
    <ImportDirectoryBuildProps>false</ImportDirectoryBuildProps>
    <FvGenUsePrecompiledAnalyzer>$USE_IMAGE</FvGenUsePrecompiledAnalyzer>
  </PropertyGroup>
  <ItemGroup>
    <ProjectReference Include="$REPO/runtime/FvGen.Runtime/FvGen.Runtime.csproj" />
    <Analyzer Include="$ANALYZER" Condition="'\$(WithFvGenAnalyzers)' == 'true'" />
  </ItemGroup>
  <Import Project="$REPO/analyzers/FvGen.Analyzers/build/FvGen.Analyzers.targets" />
</Project>
XML
cd "$WORK"
# Warm-up: restore and build the runtime reference once.
dotnet build Bench.csproj -c Release -p:WithFvGenAnalyzers=true -p:UseSharedCompilation=$SHARED > /dev/null
dotnet build Bench.csproj -c Release -p:WithFvGenAnalyzers=false -p:UseSharedCompilation=$SHARED > /dev/null
if [ "$COMPILER" = server ]; then
  # The server's first builds load and JIT-compile the compiler and the analyzers: not measured.
  for ((w = 1; w <= 3; w++)); do
    for mode in false true; do
      touch Kernels/*.cs
      dotnet build Bench.csproj -c Release -p:WithFvGenAnalyzers=$mode -p:UseSharedCompilation=true > /dev/null
    done
  done
fi
median() { sort -g | awk '{ v[NR] = $1 } END { print (NR % 2) ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2 }'; }
: > times-false.txt
: > times-true.txt
: > fvgen.txt
for ((r = 1; r <= R; r++)); do
  for mode in false true; do
    # References are up to date: touching the kernels makes the compiler run on the benchmark project only.
    touch Kernels/*.cs
    start=$(date +%s.%N)
    dotnet build Bench.csproj -c Release -p:WithFvGenAnalyzers=$mode -p:UseSharedCompilation=$SHARED -p:ReportAnalyzer=true -v:d > "build-$mode.log"
    end=$(date +%s.%N)
    seconds=$(echo "$end - $start" | bc)
    echo "$seconds" >> "times-$mode.txt"
    # The analyzer report of the benchmark project's compiler call (the last one in the log).
    fvgen=$( (grep -E "^\s+[<0-9.]+\s+[<0-9]+\s+${NAME//./\\.}, Version" "build-$mode.log" || true) | tail -1 | awk '{ print $1 }')
    if [ "$mode" = true ]; then echo "${fvgen:-0}" >> fvgen.txt; fi
    echo "run $r, analyzers=$mode: build ${seconds} s, FvGen analyzer time ${fvgen:--} s"
  done
done
echo "--- compiler analyzer report of the last build with the analyzers ---"
(grep -E "^\s+[<0-9.]+\s+[<0-9]+\s+${NAME//./\\.}" build-true.log || true) | tail -8 | cut -c1-120
# Analyzers are skipped by the compiler when all their diagnostics are suppressed: keep FVC rules enabled here.
echo "FVC diagnostics reported: $(grep -c 'warning FVC' build-true.log || true)"
without=$(median < times-false.txt)
with=$(median < times-true.txt)
analyzers=$(median < fvgen.txt)
echo "--- medians of $R runs, $N kernels, compiler $COMPILER, $(nproc) cores, load average now $(cut -d' ' -f1-3 /proc/loadavg) ---"
echo "build without analyzers: $without s"
echo "build with analyzers:    $with s"
spread() { sort -g "$1" | awk 'NR == 1 { lo = $1 } { hi = $1 } END { print lo "–" hi }'; }
echo "FvGen analyzer time:     $analyzers s ($(echo "scale=1; 100 * $analyzers / $with" | bc) % of the build with them; runs $(spread fvgen.txt) s)"
# Each run's own share (its analyzer time over its own build): on a noisy machine the runs' shares
# scatter more than the ratio of the medians shows.
paste times-true.txt fvgen.txt | awk '{ printf "%.1f\n", 100 * $2 / $1 }' > shares.txt
echo "share of each run:       median $(median < shares.txt) % (runs $(spread shares.txt) %)"
echo "build time added:        $(echo "scale=1; 100 * ($with - $without) / $without" | bc) % of the build without them"
echo "files in $WORK"
