namespace DesignCompiler.Diagnostics;

/// <summary>
/// Every diagnostic the tool can report, in one place. Ids never change meaning once
/// released; tests assert ids and positions, a few pin the full text.
/// </summary>
public static class DiagnosticCatalog
{
    private static DiagnosticDescriptor Error(string id, string format) => new(id, Severity.Error, format);
    private static DiagnosticDescriptor Warning(string id, string format) => new(id, Severity.Warning, format);

    // --- TD1xxx: syntax. The parser words these messages itself. --------------
    public static readonly DiagnosticDescriptor Unexpected = Error("TD1001", "{0}");
    public static readonly DiagnosticDescriptor UnknownStatement = Error("TD1002", "{0}");
    public static readonly DiagnosticDescriptor TrailingText = Error("TD1003", "{0}");
    public static readonly DiagnosticDescriptor MissingHeader = Error("TD1004", "{0}");
    public static readonly DiagnosticDescriptor UnclosedTrial = Error("TD1005", "{0}");
    public static readonly DiagnosticDescriptor TextAfterTrial = Error("TD1006", "{0}");
    public static readonly DiagnosticDescriptor InputTooLarge = Error("TD1010", "{0}");

    // --- TD2xxx: binding and validation ---------------------------------------
    public static readonly DiagnosticDescriptor MissingStatement = Error("TD2001", "the design has no '{0}' statement: {1}");
    public static readonly DiagnosticDescriptor RepeatedStatement = Error("TD2002", "'{0}' is given more than once; the first is on line {1}");
    public static readonly DiagnosticDescriptor NotWholeNumber = Error("TD2003", "{0} must be a whole number, not {1}");
    public static readonly DiagnosticDescriptor OutOfRange = Error("TD2004", "{0} must be {1}, not {2}");
    public static readonly DiagnosticDescriptor EmptyName = Error("TD2005", "{0} must not be empty");

    public static readonly DiagnosticDescriptor DuplicateArm = Error("TD2010", "arm code '{0}' is used twice; the first is on line {1}");
    public static readonly DiagnosticDescriptor UnknownArm = Error("TD2011", "there is no arm '{0}'");
    public static readonly DiagnosticDescriptor ReservedArmCode = Error("TD2012", "'{0}' is a word of the language and cannot be an arm code");
    public static readonly DiagnosticDescriptor TooFewArms = Error("TD2013", "a trial compares at least 2 arms; this design has {0}");
    public static readonly DiagnosticDescriptor DuplicateBlock = Error("TD2014", "block name '{0}' is used twice; the first is on line {1}");
    public static readonly DiagnosticDescriptor PlotsAndBlocks = Error("TD2015", "'plots N per round' and 'block' statements cannot be mixed");
    public static readonly DiagnosticDescriptor LayoutMismatch = Error("TD2016", "block '{0}' has {1} plots but its layout {2} x {3} holds {4}");
    public static readonly DiagnosticDescriptor DuplicateArmLabel = Warning("TD2017", "arms '{0}' and '{1}' have the same label \"{2}\"; crews tell arms apart by label");
    public static readonly DiagnosticDescriptor DuplicateArmOption = Error("TD2018", "arm '{0}' gives '{1}' more than once");

    public static readonly DiagnosticDescriptor PriorMismatch = Error("TD2020", "a {0} prior does not fit a {1} outcome; use {2}");
    public static readonly DiagnosticDescriptor NoPrior = Error("TD2021", "arm '{0}' has no prior and the design has no 'default prior'");
    public static readonly DiagnosticDescriptor NoiseGuessUnused = Warning("TD2023", "the noise guess is not used: the outcome's noise sd is known ({0})");
    public static readonly DiagnosticDescriptor CostWithoutPrice = Error("TD2024", "arm '{0}' has a cost but the design has no 'price' to weigh it against");
    public static readonly DiagnosticDescriptor PolicyNeedsFamily = Error("TD2025", "policy '{0}' needs {1}");

    public static readonly DiagnosticDescriptor ControlNotNamed = Error("TD2040", "'control' in a limit or rotation rule needs a 'control ARM' statement");
    public static readonly DiagnosticDescriptor ContradictoryBounds = Error("TD2041", "{0}: the limits on {1} ask for at least {2} and at most {3} plots {4}");
    public static readonly DiagnosticDescriptor MinimumsExceedPlots = Error("TD2042", "{0}{1}: the minimums need {2} plots but there are only {3}");
    public static readonly DiagnosticDescriptor MaximumsBelowPlots = Error("TD2043", "{0}{1}: the maximums allow only {2} of the {3} plots to be sown");
    public static readonly DiagnosticDescriptor StockBelowMinimums = Error("TD2044", "stock of {0} is {1} plots but its minimums over rounds {2} need {3}");
    public static readonly DiagnosticDescriptor WindowOutsideTrial = Error("TD2045", "{0}");
    public static readonly DiagnosticDescriptor ArmNeverAvailable = Warning("TD2046", "arm '{0}' can never be sown: {1}");
    public static readonly DiagnosticDescriptor RepeatedWindow = Error("TD2047", "arm '{0}' already has {1} on line {2}");
    public static readonly DiagnosticDescriptor ControlCannotDrop = Warning("TD2048", "the control '{0}' is never dropped; the drop rule applies to the other arms");

    public static readonly DiagnosticDescriptor DuplicateScenario = Error("TD2060", "scenario \"{0}\" is defined twice; the first is on line {1}");
    public static readonly DiagnosticDescriptor ScenarioMissingArm = Error("TD2061", "scenario \"{0}\" gives no value for {1}");
    public static readonly DiagnosticDescriptor ScenarioOutsideSupport = Error("TD2062", "scenario value {0} for '{1}' is outside what a {2} outcome can take: {3}");
    public static readonly DiagnosticDescriptor ScenarioRepeatedArm = Error("TD2063", "scenario \"{0}\" gives '{1}' twice");
    public static readonly DiagnosticDescriptor ScenarioNoiseNotNormal = Error("TD2064", "'noise' in a scenario applies only to a normal outcome, not {0}");
    public static readonly DiagnosticDescriptor ScenarioDispersionNotCount = Error("TD2065", "'dispersion' in a scenario applies only to a count outcome, not {0}");
    public static readonly DiagnosticDescriptor AdjustedModelNotNormal = Error("TD2080", "'model {0}' needs a normal outcome; this design's outcome is {1}");
    public static readonly DiagnosticDescriptor AdjustedModelNothingToAdjust = Warning("TD2081", "'model {0}' has nothing to adjust for: the design has a single {1}");
    public static readonly DiagnosticDescriptor RotationRestTooLong = Warning("TD2070", "a rest of {0} rounds in a {1}-round trial means each plot grows these arms at most once");
    public static readonly DiagnosticDescriptor RotationNeedsArms = Error("TD2072", "'every arm rest {0} rounds' needs at least {1} arms to sow a plot every round; the design has {2}");
    public static readonly DiagnosticDescriptor RotationSelf = Error("TD2071", "'{0} not after {0}' forbids a repeat; write 'rotation {0} rest 1 round'");

    // --- TD3xxx: planning -------------------------------------------------------
    public static readonly DiagnosticDescriptor RoundInfeasible = Error("TD3001", "{0}");
    public static readonly DiagnosticDescriptor RotationInfeasible = Error("TD3002", "{0}");
    public static readonly DiagnosticDescriptor RoundOutOfRange = Error("TD3003", "round {0} is outside the trial's {1} rounds");
    public static readonly DiagnosticDescriptor NotSupportedYet = Error("TD3004", "{0}");
    public static readonly DiagnosticDescriptor TrialStopped = Warning("TD3005", "{0}");

    // --- TD5xxx: files and the command line -------------------------------------
    public static readonly DiagnosticDescriptor FileUnreadable = Error("TD5001", "cannot read the file: {0}");
    public static readonly DiagnosticDescriptor OutputUnwritable = Error("TD5002", "cannot write the output: {0}");
}
