// Generated residuals against hand-written loops of the same flux. Run in Release:
//   dotnet run -c Release --project benchmarks/FvGen.Benchmarks
// Results go to BenchmarkDotNet.Artifacts/; docs/performance.md holds the reviewed table.
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Running;
using BenchmarkDotNet.Toolchains.InProcess.Emit;
using FvGen.Benchmarks;

var config = DefaultConfig.Instance
    .AddJob(Job.Default.WithToolchain(InProcessEmitToolchain.Instance).WithWarmupCount(4).WithIterationCount(15));
var summary = BenchmarkRunner.Run<ResidualBenchmarks>(config, args);
if (summary.HasCriticalValidationErrors)
{
    Console.Error.WriteLine("BenchmarkDotNet reported critical validation errors; no timings are valid.");
    return 1;
}

return 0;
