#!/usr/bin/env bash
# Builds a generated project of N kernels (copies of the corpus, each in its own namespace) twice —
# without and with the FvGen analyzers — and prints the compiler's own analyzer timing
# (-p:ReportAnalyzer=true) next to the build times. Not part of the test run: speed is never asserted.
# Usage: tests/FvGen.Analyzers.Tests/Benchmark/run-analyzer-benchmark.sh [N] [work-dir]
set -euo pipefail
N="${1:-500}"
REPO="$(cd "$(dirname "$0")/../../.." && pwd)"
WORK="${2:-$(mktemp -d)}"
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
  </PropertyGroup>
  <ItemGroup>
    <ProjectReference Include="$REPO/runtime/FvGen.Runtime/FvGen.Runtime.csproj" />
    <ProjectReference Include="$REPO/analyzers/FvGen.Analyzers/FvGen.Analyzers.csproj" OutputItemType="Analyzer" ReferenceOutputAssembly="false" Condition="'\$(WithFvGenAnalyzers)' == 'true'" />
  </ItemGroup>
</Project>
XML
cd "$WORK"
dotnet build Bench.csproj -c Release -p:WithFvGenAnalyzers=true > /dev/null   # warm: restore and build references
dotnet build Bench.csproj -c Release -p:WithFvGenAnalyzers=false > /dev/null
for mode in false true; do
  # References are up to date: touching the kernels makes the compiler run on the benchmark project only.
  touch Kernels/*.cs
  start=$(date +%s.%N)
  dotnet build Bench.csproj -c Release -p:WithFvGenAnalyzers=$mode -p:ReportAnalyzer=true -v:d > "build-$mode.log"
  end=$(date +%s.%N)
  echo "analyzers=$mode: build $(echo "$end - $start" | bc) s"
done
# The last compiler call of the log is the benchmark project's own (the references are built first).
echo "--- compiler analyzer report for the benchmark project (analyzers=true) ---"
awk '/Total analyzer execution time/ { block = "" } { block = block $0 "\n" } END { }' build-true.log > /dev/null
grep -n "Total analyzer execution time" build-true.log | tail -1
grep -E "^\s+[<0-9.]+\s+[<0-9]+\s+FvGen\.Analyzers" build-true.log | tail -8 | cut -c1-120
echo "FVC diagnostics reported: $(grep -c 'warning FVC' build-true.log || true)"
# Analyzers are skipped by the compiler when all their diagnostics are suppressed: keep FVC rules enabled here.
echo "kernels: $N, files in $WORK"
