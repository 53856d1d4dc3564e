using System.Globalization;

namespace DesignCompiler.Cli.Commands;

/// <summary>
/// The line a long simulation redraws on a terminal: trials done, and once the pace is known, about how long
/// is left. Display only: the clock it reads never reaches a report.
/// </summary>
public static class ProgressLine
{
    /// <summary>Below this much elapsed time the pace is mostly start-up, and an estimate would mislead.</summary>
    private static readonly TimeSpan Settled = TimeSpan.FromSeconds(2);

    /// <summary>Wide enough for the longest line, so a shorter one overwrites it completely.</summary>
    public const int Width = 72;

    public static string Text(long done, long total, TimeSpan elapsed)
    {
        var line = string.Create(CultureInfo.InvariantCulture, $"simulating: {done} of {total} trials");
        if (done > 0 && done < total && elapsed >= Settled)
        {
            var left = elapsed.TotalSeconds * (total - done) / done;
            line += ", about " + Duration(left) + " left";
        }
        return line.PadRight(Width);
    }

    /// <summary>Seconds to 5 s under a minute, to 10 s under an hour, to the minute beyond; rounded up, so "about" errs long.</summary>
    public static string Duration(double seconds)
    {
        if (seconds < 60) return string.Create(CultureInfo.InvariantCulture, $"{Math.Max(5, 5 * Math.Ceiling(seconds / 5))} s");
        if (seconds < 3600)
        {
            var tens = (long)Math.Ceiling(seconds / 10);
            long minutes = tens / 6, rest = tens % 6 * 10;
            return rest == 0
                ? string.Create(CultureInfo.InvariantCulture, $"{minutes} min")
                : string.Create(CultureInfo.InvariantCulture, $"{minutes} min {rest} s");
        }
        var totalMinutes = (long)Math.Ceiling(seconds / 60);
        long hours = totalMinutes / 60, mins = totalMinutes % 60;
        return mins == 0
            ? string.Create(CultureInfo.InvariantCulture, $"{hours} h")
            : string.Create(CultureInfo.InvariantCulture, $"{hours} h {mins} min");
    }
}
