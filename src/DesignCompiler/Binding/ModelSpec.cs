using DesignCompiler.Text;

namespace DesignCompiler.Binding;

/// <summary>
/// Which field and season effects the posterior of a normal outcome separates from the arm
/// effects. With neither, each arm's posterior is its own conjugate update (the default).
/// </summary>
public sealed record ModelSpec(bool AdjustsForBlock, bool AdjustsForRound, TextSpan Span)
{
    public static ModelSpec Independent { get; } = new(false, false, default);

    public bool IsAdjusted => AdjustsForBlock || AdjustsForRound;

    public string Describe() => (AdjustsForBlock, AdjustsForRound) switch
    {
        (true, true) => "adjusts for block and round",
        (true, false) => "adjusts for block",
        (false, true) => "adjusts for round",
        _ => "independent",
    };
}
