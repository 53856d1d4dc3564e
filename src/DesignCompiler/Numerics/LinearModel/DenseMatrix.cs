namespace DesignCompiler.Numerics.LinearModel;

/// <summary>The few products of small dense matrices (row-major <c>double[,]</c>) that a linear model needs.</summary>
public static class DenseMatrix
{
    /// <summary>XᵀX, summed in row order so the result does not depend on anything but X.</summary>
    public static double[,] Gram(double[,] x)
    {
        ArgumentNullException.ThrowIfNull(x);
        int n = x.GetLength(0), p = x.GetLength(1);
        var g = new double[p, p];
        for (int r = 0; r < n; r++)
            for (int i = 0; i < p; i++)
            {
                double xi = x[r, i];
                if (xi == 0) continue;
                for (int j = 0; j <= i; j++) g[i, j] += xi * x[r, j];
            }
        for (int i = 0; i < p; i++)
            for (int j = 0; j < i; j++) g[j, i] = g[i, j];
        return g;
    }

    /// <summary>Xᵀy.</summary>
    public static double[] TransposeTimes(double[,] x, ReadOnlySpan<double> y)
    {
        ArgumentNullException.ThrowIfNull(x);
        int n = x.GetLength(0), p = x.GetLength(1);
        if (y.Length != n) throw new ArgumentException("y must have one entry per row of X.", nameof(y));
        var result = new double[p];
        for (int r = 0; r < n; r++)
            for (int i = 0; i < p; i++) result[i] += x[r, i] * y[r];
        return result;
    }

    /// <summary>A·v.</summary>
    public static double[] Times(double[,] a, ReadOnlySpan<double> v)
    {
        ArgumentNullException.ThrowIfNull(a);
        int n = a.GetLength(0), p = a.GetLength(1);
        if (v.Length != p) throw new ArgumentException("v must have one entry per column of A.", nameof(v));
        var result = new double[n];
        for (int r = 0; r < n; r++)
        {
            double s = 0;
            for (int i = 0; i < p; i++) s += a[r, i] * v[i];
            result[r] = s;
        }
        return result;
    }

    /// <summary>vᵀ·A·v for a square A.</summary>
    public static double QuadraticForm(double[,] a, ReadOnlySpan<double> v)
    {
        var av = Times(a, v);
        double s = 0;
        for (int i = 0; i < v.Length; i++) s += v[i] * av[i];
        return s;
    }
}
