using System.Numerics;

namespace DesignCompiler.Simulation.Accumulators;

/// <summary>
/// The exact sum of any number of doubles, kept as a wide fixed-point integer in units of
/// 2^-1074 (the smallest subnormal), so that no addition ever rounds.
/// </summary>
/// <remarks>
/// Floating-point addition is not associative: summing the same replications in another order
/// (another thread count, shards merged later) would change the last digits of every figure.
/// An exact sum is the same whatever the order, so a report is byte-identical for one thread,
/// eight threads or four shards merged (the idea of a long accumulator; U. Kulisch, "Computer
/// Arithmetic and Validity", 2008, from memory). Each double is m·2^e with a 53-bit m; it is
/// added as at most three 32-bit pieces into signed 64-bit limbs, which can absorb 2^31 such
/// additions before carries must be propagated.
/// </remarks>
public sealed class ExactSum
{
    private const int LimbBits = 32;

    /// <summary>2098 bits cover every double's bits at scale 2^-1074; 64 more hold the carries of up to 2^63 additions.</summary>
    internal const int LimbCount = 68;

    private const int AddsBeforeCarry = 1 << 30;
    private const long LowMask = 0xFFFF_FFFFL;

    private readonly long[] _limbs = new long[LimbCount];
    private int _pendingAdds;

    public void Add(double value)
    {
        if (!double.IsFinite(value)) throw new ArgumentOutOfRangeException(nameof(value), value, "Only finite values can be summed exactly.");
        if (value == 0) return;

        var bits = BitConverter.DoubleToInt64Bits(value);
        var exponentField = (int)((bits >> 52) & 0x7FF);
        var mantissa = (ulong)bits & 0xF_FFFF_FFFF_FFFFUL;
        // Position of the mantissa's lowest bit above 2^-1074.
        int position;
        if (exponentField == 0)
        {
            position = 0;
        }
        else
        {
            mantissa |= 1UL << 52;
            position = exponentField - 1;
        }

        var limb = position / LimbBits;
        var shifted = (UInt128)mantissa << (position % LimbBits);
        var sign = value < 0 ? -1L : 1L;
        _limbs[limb] += sign * (long)(ulong)(shifted & LowMask);
        _limbs[limb + 1] += sign * (long)(ulong)((shifted >> 32) & LowMask);
        _limbs[limb + 2] += sign * (long)(ulong)((shifted >> 64) & LowMask);
        if (++_pendingAdds >= AddsBeforeCarry) Normalize();
    }

    public void Add(ExactSum other)
    {
        other.Normalize();
        Normalize();
        for (var k = 0; k < LimbCount; k++) _limbs[k] += other._limbs[k];
        _pendingAdds = 1;
        Normalize();
    }

    /// <summary>The sum as an integer count of 2^-1074.</summary>
    public BigInteger Units
    {
        get
        {
            Normalize();
            var result = BigInteger.Zero;
            for (var k = LimbCount - 1; k >= 0; k--) result = (result << LimbBits) + _limbs[k];
            return result;
        }
    }

    /// <summary>The sum, rounded once to the nearest double.</summary>
    public double Value => ScaledInteger.ToDouble(Units, -1074);

    /// <summary>Replaces the sum with an integer count of 2^-1074 (read back from a saved summary).</summary>
    public void SetUnits(BigInteger units)
    {
        Array.Clear(_limbs);
        _pendingAdds = 0;
        var negative = units.Sign < 0;
        var magnitude = BigInteger.Abs(units);
        for (var k = 0; k < LimbCount && !magnitude.IsZero; k++)
        {
            _limbs[k] = (long)(ulong)(magnitude & LowMask) * (negative ? -1 : 1);
            magnitude >>= LimbBits;
        }
        if (!magnitude.IsZero) throw new ArgumentOutOfRangeException(nameof(units), "The value is too large for an exact sum.");
        _pendingAdds = 1;
        Normalize();
    }

    /// <summary>
    /// Propagates carries (when any limb may be out of range) so every limb but the top one lies in [0, 2^32): the canonical form,
    /// the same for the same sum however it was reached.
    /// </summary>
    private void Normalize()
    {
        if (_pendingAdds == 0) return;
        long carry = 0;
        for (var k = 0; k < LimbCount - 1; k++)
        {
            var t = _limbs[k] + carry;
            _limbs[k] = t & LowMask;
            carry = t >> LimbBits;
        }
        _limbs[LimbCount - 1] += carry;
        _pendingAdds = 0;
    }
}
