namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// P(lower ≤ X ≤ upper) for X ~ N(0, R) after <see cref="PrioritisedCholesky"/>: X = L y with y standard normal
/// and L lower triangular in the chosen order, so the constraints peel off one y at a time (Genz 1992, "Numerical
/// computation of multivariate normal probabilities", J. Comput. Graph. Statist. 1:141–149, §2). Rows whose
/// variable is a linear function of earlier ones (a singular R) have no column of their own; each is attached to
/// the last column it depends on and narrows that column's interval.
/// </summary>
/// <remarks>
/// Optionally it also carries a free variable θ with known covariances with X, written θ = Σ M_c y_c + (an
/// independent rest), so that E[θ · 1{lower ≤ X ≤ upper}] comes out of the same points as the probability.
/// Immutable after construction: several threads may evaluate one problem.
/// </remarks>
internal sealed partial class SeparatedProblem
{
    internal SeparatedProblem(int rank, int[] columnRowStart, double[][] coefficients, double[] lower, double[] upper, double[]? moment)
    {
        Rank = rank;
        ColumnRowStart = columnRowStart;
        Coefficients = coefficients;
        Lower = lower;
        Upper = upper;
        Moment = moment;
    }

    /// <summary>A problem whose answer is known without integrating: probability 1 (or 0 if infeasible), moment 0.</summary>
    internal static SeparatedProblem Certain(bool feasible) =>
        new(0, [0], [], [], [], null) { Infeasible = !feasible };

    /// <summary>The number of columns (the rank of R).</summary>
    public int Rank { get; }

    /// <summary>True when a deterministic constraint can never hold: the probability is exactly 0.</summary>
    public bool Infeasible { get; private init; }

    /// <summary>Rows ColumnRowStart[c] .. ColumnRowStart[c+1] − 1 bound column c; the first is c's own row.</summary>
    internal int[] ColumnRowStart { get; }

    /// <summary>Row r's coefficients on columns 0..c, c the column it bounds (the last is nonzero).</summary>
    internal double[][] Coefficients { get; }

    /// <summary>Row limits, standardised (may be infinite).</summary>
    internal double[] Lower { get; }

    internal double[] Upper { get; }

    /// <summary>M_c of the free variable, or null when none was asked for.</summary>
    internal double[]? Moment { get; }

    /// <summary>
    /// Column c's interval given y_0..y_{c−1}: the intersection over the rows bounding it. Every limit is
    /// multiplied by <paramref name="scale"/> (the chi scale s of the t case; 1 for the normal).
    /// </summary>
    internal void Interval(int c, ReadOnlySpan<double> y, double scale, out double lower, out double upper)
    {
        lower = double.NegativeInfinity;
        upper = double.PositiveInfinity;
        for (int r = ColumnRowStart[c]; r < ColumnRowStart[c + 1]; r++)
        {
            double[] row = Coefficients[r];
            double sum = 0;
            for (int l = 0; l < c; l++) sum = Math.FusedMultiplyAdd(row[l], y[l], sum);
            double pivot = row[c];
            double a = (Lower[r] * scale - sum) / pivot, b = (Upper[r] * scale - sum) / pivot;
            if (pivot < 0) (a, b) = (b, a);
            if (a > lower) lower = a;
            if (b < upper) upper = b;
        }
    }

    /// <summary>
    /// The separated integrand at one point: Genz's f = Π_c P(interval c) with y_c drawn inside interval c from
    /// the coordinates <paramref name="w"/> (one per column but the last), and the moment f · E[θ | y].
    /// </summary>
    internal double Evaluate(ReadOnlySpan<double> w, Span<double> y, double scale, out double moment)
    {
        double f = 1.0;
        moment = 0.0;
        int last = Rank - 1;
        for (int c = 0; c < last; c++)
        {
            Interval(c, y, scale, out double lower, out double upper);
            if (!(lower < upper)) return 0.0;
            double u = Math.Clamp(w[c], RichtmyerPoints.Epsilon, 1.0 - RichtmyerPoints.Epsilon);
            f *= TruncatedNormal.Sample(lower, upper, u, out y[c]);
            if (f == 0) return 0.0;
        }
        Interval(last, y, scale, out double lo, out double hi);
        if (!(lo < hi)) return 0.0;
        double mass = NormalTail.Between(lo, hi);
        if (Moment is double[] m)
        {
            // E[y_last · 1{interval}] = φ(lo) − φ(hi) exactly, so the last column needs no point of its own.
            double known = 0;
            for (int c = 0; c < last; c++) known = Math.FusedMultiplyAdd(m[c], y[c], known);
            moment = f * (known * mass + m[last] * (NormalTail.Density(lo) - NormalTail.Density(hi)));
        }
        return f * mass;
    }
}
