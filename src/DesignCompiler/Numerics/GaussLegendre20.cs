using System.Collections.Immutable;

namespace DesignCompiler.Numerics;

/// <summary>
/// The 20-point Gauss–Legendre rule on [−1, 1], as ten symmetric pairs. Nodes and weights were computed with
/// mpmath at 40 digits (roots of P₂₀ by Newton's method, weights 2/((1−x²)P₂₀′(x)²)).
/// </summary>
/// <remarks>
/// Immutable arrays rather than spans over constant data: unoptimised (Debug) code builds such spans through
/// a runtime helper that allocates, and the quadrature promises not to.
/// </remarks>
internal static class GaussLegendre20
{
    internal static readonly ImmutableArray<double> Abscissas =
    [
        0.07652652113349734, 0.22778585114164507, 0.37370608871541955, 0.5108670019508271, 0.636053680726515,
        0.7463319064601508, 0.8391169718222188, 0.912234428251326, 0.9639719272779138, 0.9931285991850949,
    ];

    internal static readonly ImmutableArray<double> Weights =
    [
        0.15275338713072584, 0.14917298647260374, 0.14209610931838204, 0.13168863844917664, 0.11819453196151841,
        0.10193011981724044, 0.08327674157670475, 0.06267204833410907, 0.04060142980038694, 0.017614007139152118,
    ];
}
