namespace DesignCompiler.Fuzz;

/// <summary>
/// One kind of input the fuzzer feeds. <see cref="Run"/> takes the raw bytes of one input; it
/// returns normally when the tool handled them (a clean result or diagnostics) and throws
/// <see cref="FuzzFinding"/> (or lets any other exception escape) when it did not, which the
/// fuzzer records as a crash.
/// </summary>
internal interface IFuzzTarget
{
    /// <summary>The argument that selects the target: <c>DesignCompiler.Fuzz NAME</c>.</summary>
    string Name { get; }

    /// <summary>What the target feeds, for the usage text.</summary>
    string Description { get; }

    /// <summary>Where its seed inputs come from, relative to the repository (globs understood by fuzz.sh).</summary>
    IReadOnlyList<string> SeedPatterns { get; }

    /// <summary>Seed inputs made in code (sheets as compile renders them, and spoilt copies); written by <c>--write-seeds DIR</c>.</summary>
    IEnumerable<(string Name, byte[] Content)> GeneratedSeeds();

    /// <summary>Inputs run once before fuzzing starts (see <see cref="WarmUp"/>): together they reach every library the target loads.</summary>
    IEnumerable<byte[]> WarmUpInputs();

    void Run(byte[] input);
}
