using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;
using System.Runtime.Intrinsics.X86;

namespace DesignCompiler.Numerics.Multivariate;

/// <summary>
/// <see cref="Map"/> for the eight points of a register. The tabulated inverse runs in lanes: each lane finds its
/// piece and runs that piece's Clenshaw recurrence, the steps of the scalar map in the same order, with the
/// repeatable log and exp in lanes, so scale and weight are the scalar ones bit for bit. The rarely used
/// logistic map (ν outside the table) is the scalar map lane by lane.
/// </summary>
internal sealed partial class ChiScale
{
    private const int Lanes = NormalTail.Lanes;

    /// <summary>Term j of the 24 pieces as three registers (pieces 0–7, 8–15, 16–23); null for the logistic map.</summary>
    private readonly Vector512<double>[][]? termsByLane;

    public void MapLanes(ReadOnlySpan<double> w, Span<double> scale, Span<double> weight)
    {
        if (termsByLane is null || !Vector512.IsHardwareAccelerated)
        {
            for (int i = 0; i < Lanes; i++) Map(w[i], out scale[i], out weight[i]);
            return;
        }
        MapTabulated(w, scale);
        weight[..Lanes].Fill(1.0);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private void MapTabulated(ReadOnlySpan<double> w, Span<double> scale)
    {
        var terms = termsByLane!;
        var lowest = Vector512.Create(RichtmyerPoints.Epsilon);
        var highest = Vector512.Create(1.0 - RichtmyerPoints.Epsilon);
        var v = Vector512.Create(w[..Lanes]);
        // Math.Clamp(w, ε, 1 − ε), then t = ln(w / (1 − w)) by the repeatable log.
        v = Vector512.ConditionalSelect(Vector512.LessThan(v, lowest), lowest,
            Vector512.ConditionalSelect(Vector512.GreaterThan(v, highest), highest, v));
        var t = RepeatableMath.Log(v / (Vector512.Create(1.0) - v));
        var reach = Vector512.Create(Reach);
        t = Vector512.ConditionalSelect(Vector512.LessThan(t, -reach), -reach,
            Vector512.ConditionalSelect(Vector512.GreaterThan(t, reach), reach, t));
        var position = (t + reach) / Vector512.Create(2 * Reach) * Vector512.Create((double)Pieces);
        // (int)position for position >= 0 is its floor; Math.Min(…, Pieces − 1).
        var piece = Vector512.Min(Vector512.Floor(position), Vector512.Create((double)(Pieces - 1)));
        var x = Vector512.Create(2.0) * (position - piece) - Vector512.Create(1.0);
        var index = Vector512.ConvertToInt64(piece);
        var high = Vector512.GreaterThanOrEqual(index, Vector512.Create(16L)).AsDouble();
        var twoX = Vector512.Create(2.0) * x;
        var b1 = Vector512<double>.Zero;
        var b2 = Vector512<double>.Zero;
        for (int j = terms.Length - 1; j >= 1; j--)
        {
            var b0 = Vector512.FusedMultiplyAdd(twoX, b1, Term(terms[j], index, high) - b2);
            b2 = b1;
            b1 = b0;
        }
        var u = Vector512.FusedMultiplyAdd(x, b1, Term(terms[0], index, high) - b2);
        RepeatableMath.Exp(u).CopyTo(scale);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector512<double> Term(Vector512<double>[] term, Vector512<long> index, Vector512<double> high) =>
        Vector512.ConditionalSelect(high, Avx512F.PermuteVar8x64(term[2], index),
            Avx512F.PermuteVar8x64x2(term[0], index, term[1]));

    private static Vector512<double>[][] TermsByLane(double[][] pieces)
    {
        var terms = new Vector512<double>[Nodes][];
        Span<double> lane = stackalloc double[Lanes];
        for (int j = 0; j < Nodes; j++)
        {
            terms[j] = new Vector512<double>[3];
            for (int r = 0; r < 3; r++)
            {
                for (int i = 0; i < Lanes; i++) lane[i] = pieces[r * Lanes + i][j];
                terms[j][r] = Vector512.Create((ReadOnlySpan<double>)lane);
            }
        }
        return terms;
    }
}
