namespace DesignCompiler.Randomness;

/// <summary>
/// Exact samplers for the distributions the simulator needs, each drawing from a caller-owned
/// <see cref="Xoshiro256StarStar"/> passed by <c>ref</c> so nothing allocates and no state is
/// hidden. Split by distribution across the <c>Samplers.*.cs</c> files.
/// </summary>
/// <remarks>
/// "Exact" means the method is exact in distribution, not an approximation such as a rounded
/// normal; the only error is double rounding. Methods that call <see cref="Math.Log"/> or
/// <see cref="Math.Exp"/> inherit the platform's last-bit rounding of those functions, so two
/// platforms could, with probability of order 1e-16 per draw, take a different branch;
/// integer draws, uniforms and shuffles are bit-identical everywhere.
/// Invalid parameters (NaN, negative counts, shapes ≤ 0) are caller bugs and throw
/// <see cref="ArgumentOutOfRangeException"/>.
/// </remarks>
public static partial class Samplers
{
}
