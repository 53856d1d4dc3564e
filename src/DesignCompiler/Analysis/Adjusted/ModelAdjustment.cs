namespace DesignCompiler.Analysis.Adjusted;

/// <summary>Which field factors the yield model takes out before comparing arms. Arms are always in it.</summary>
public enum ModelAdjustment
{
    /// <summary>y = μ_arm + ε.</summary>
    None,

    /// <summary>y = μ_arm + α_block + ε, block effects summing to zero.</summary>
    Block,

    /// <summary>y = μ_arm + α_block + γ_round + ε, block and round effects each summing to zero.</summary>
    BlockAndRound,

    /// <summary>y = μ_arm + γ_round + ε, round effects summing to zero.</summary>
    Round,
}
