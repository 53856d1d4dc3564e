namespace DesignCompiler.Fuzz;

/// <summary>An input the tool mishandled without throwing: a position outside the text, NaN in a plan, and so on.</summary>
internal sealed class FuzzFinding(string message) : Exception(message);

/// <summary>Turns broken rules (from OutputInvariants) into a finding the fuzzer records as a crash.</summary>
internal static class Findings
{
    public static void ThrowIfAny(List<string> problems)
    {
        if (problems.Count > 0) throw new FuzzFinding(string.Join("\n", problems));
    }
}
