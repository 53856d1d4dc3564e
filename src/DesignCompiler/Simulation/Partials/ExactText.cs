using System.Globalization;
using System.Numerics;
using DesignCompiler.Simulation.Accumulators;

namespace DesignCompiler.Simulation.Partials;

/// <summary>
/// Exact sums as text: "0" or "[-]0xHEXpE", meaning the odd integer HEX times 2^E, in the
/// spirit of C99 hexadecimal floating constants but with as many digits as the sum needs. A
/// decimal number would have to be rounded; this never is.
/// </summary>
internal static class ExactText
{
    public static string Format(ExactSum sum)
    {
        var units = sum.Units;
        if (units.IsZero) return "0";
        var exponent = -1074;
        var magnitude = BigInteger.Abs(units);
        var zeros = (int)BigInteger.TrailingZeroCount(magnitude);
        magnitude >>= zeros;
        exponent += zeros;
        var hex = magnitude.ToString("x", CultureInfo.InvariantCulture).TrimStart('0');
        return (units.Sign < 0 ? "-" : "") + "0x" + hex + "p" + exponent.ToString(CultureInfo.InvariantCulture);
    }

    /// <summary>The count of 2^-1074 the text stands for; <see cref="FormatException"/> when it is not an exact sum.</summary>
    public static BigInteger Parse(string text)
    {
        if (text == "0") return BigInteger.Zero;
        var negative = text.StartsWith('-');
        var body = negative ? text[1..] : text;
        var p = body.IndexOf('p');
        if (!body.StartsWith("0x", StringComparison.Ordinal) || p < 3)
            throw new FormatException($"'{text}' is not an exact sum");
        var hex = body[2..p];
        if (hex.Any(c => !Uri.IsHexDigit(c))) throw new FormatException($"'{text}' is not an exact sum");
        if (!int.TryParse(body[(p + 1)..], NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var exponent) || exponent < -1074 || exponent > 1100)
            throw new FormatException($"'{text}' has an exponent out of range");
        var magnitude = BigInteger.Parse("0" + hex, NumberStyles.AllowHexSpecifier, CultureInfo.InvariantCulture) << (exponent + 1074);
        return negative ? -magnitude : magnitude;
    }
}
