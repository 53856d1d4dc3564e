using BenchmarkDotNet.Running;
using DesignCompiler.Benchmarks;

// dotnet run -c Release --project tests/DesignCompiler.Benchmarks -- --filter '*'
// Add --short for a quick check (in-process, few iterations); every other argument goes to BenchmarkDotNet.
var quick = args.Contains("--short");
var rest = args.Where(a => a != "--short").ToArray();
BenchmarkSwitcher.FromAssembly(typeof(BenchmarkSetup).Assembly).Run(rest, BenchmarkSetup.Config(quick));
