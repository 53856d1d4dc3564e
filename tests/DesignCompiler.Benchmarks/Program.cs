using BenchmarkDotNet.Running;
using DesignCompiler.Benchmarks;

// dotnet run -c Release --project tests/DesignCompiler.Benchmarks -- --filter '*'
// Add --short for a quick check (in-process, few iterations); every other argument goes to BenchmarkDotNet.
// --reference-timing VECTORS times P(best) on the C reference's ten-arm set the way the reference times
// itself (a plain loop), for tests/bench-vs-c.sh.
if (args.Length == 2 && args[0] == "--reference-timing")
{
    ReferenceTiming.Run(int.Parse(args[1], System.Globalization.CultureInfo.InvariantCulture));
    return;
}
var quick = args.Contains("--short");
var rest = args.Where(a => a != "--short").ToArray();
BenchmarkSwitcher.FromAssembly(typeof(BenchmarkSetup).Assembly).Run(rest, BenchmarkSetup.Config(quick));
