using DesignCompiler.Diagnostics;

namespace DesignCompiler.Simulation;

/// <summary>
/// The problems simulate, compare and merge report. Kept beside the simulator until the
/// owner moves them into <see cref="DiagnosticCatalog"/>; the ids are reserved for them.
/// </summary>
public static class SimulationDiagnostics
{
    public static readonly DiagnosticDescriptor NoScenarios = new("TD3101", Severity.Error, "the design has no scenarios to simulate");
    public static readonly DiagnosticDescriptor UnknownScenario = new("TD3102", Severity.Error, "the design has no scenario named '{0}'");
    public static readonly DiagnosticDescriptor NothingToCompare = new("TD3103", Severity.Error, "the two designs share no scenario to compare on");
    public static readonly DiagnosticDescriptor PartialUnreadable = new("TD5101", Severity.Error, "not a trialc partial simulation summary: {0}");
    public static readonly DiagnosticDescriptor PartialsDisagree = new("TD5102", Severity.Error, "this part belongs to a different simulation than {0}: {1}");
    public static readonly DiagnosticDescriptor ShardsIncomplete = new("TD5103", Severity.Error, "{0}");
}
