using DesignCompiler.Text;

namespace DesignCompiler.Binding;

/// <summary>One treatment. <see cref="Index"/> is its position in the design, the order used everywhere.</summary>
public sealed record ArmSpec(int Index, string Code, string Label, PriorSpec Prior, double Cost, TextSpan Span);
