namespace DesignCompiler.Planning.Policies;

/// <summary>Equal allocation: every arm that may be sown gets the same share.</summary>
public sealed class EqualPolicy : IAllocationPolicy
{
    public void TargetShares(PolicyContext context, Span<double> shares)
    {
        var count = 0;
        for (var i = 0; i < shares.Length; i++) if (context.Available[i]) count++;
        for (var i = 0; i < shares.Length; i++) shares[i] = context.Available[i] ? 1.0 / count : 0;
    }
}
