namespace DesignCompiler.Analysis;

/// <summary>Why the recorded data do not support an analysis, in words a trial manager can act on.</summary>
/// <param name="Kind">A stable name for the problem, so a command can map it to its own diagnostic id.</param>
/// <param name="Message">What is wrong with the data.</param>
/// <param name="Hint">How to put it right.</param>
public sealed record AnalysisProblem(AnalysisProblemKind Kind, string Message, string Hint);

public enum AnalysisProblemKind
{
    /// <summary>Fewer than two treatments or two blocks.</summary>
    TableTooSmall,

    /// <summary>A treatment or a block has no recorded plot at all.</summary>
    EmptyTreatmentOrBlock,

    /// <summary>The recorded plots split into groups of treatments and blocks that share no plot.</summary>
    Disconnected,

    /// <summary>So many plots are missing that no degree of freedom is left for error.</summary>
    NoErrorDegreesOfFreedom,

    /// <summary>Yates's iteration for several missing plots did not settle within its sweep limit.</summary>
    MissingPlotsDidNotSettle,
}

/// <summary>An analysis, or the problem that prevented it. Problems are data here as everywhere in trialc.</summary>
public sealed record AnalysisResult<T>(T? Value, AnalysisProblem? Problem) where T : class
{
    public bool Succeeded => Problem is null;

    public static AnalysisResult<T> Ok(T value) => new(value, null);

    public static AnalysisResult<T> Fail(AnalysisProblemKind kind, string message, string hint) => new(null, new AnalysisProblem(kind, message, hint));
}
