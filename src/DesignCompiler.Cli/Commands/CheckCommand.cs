using System.CommandLine;

namespace DesignCompiler.Cli.Commands;

/// <summary><c>trialc check DESIGN</c>: every problem in a design, at once, with positions.</summary>
internal static class CheckCommand
{
    public static Command Create(CliConsole console)
    {
        var design = new Argument<string>("DESIGN") { Description = "The design file (*.trial) to check." };
        var command = new Command("check", "Check a design and list every problem with its position.");
        command.Arguments.Add(design);
        command.SetAction(parse =>
        {
            var path = parse.GetValue(design)!;
            var (checkedDesign, diagnostics) = DesignLoader.Load(path);
            if (console.Report(diagnostics)) return ExitCodes.InputErrors;
            console.Out.WriteLine(FormattableString.Invariant(
                $"{path}: ok: trial \"{checkedDesign!.Name}\", {checkedDesign.Arms.Count} arms, {checkedDesign.Rounds} round{(checkedDesign.Rounds == 1 ? "" : "s")}, {checkedDesign.PlotsPerRound} plots per round in {checkedDesign.Blocks.Count} block{(checkedDesign.Blocks.Count == 1 ? "" : "s")}"));
            return ExitCodes.Ok;
        });
        return command;
    }
}
