using DesignCompiler.Rendering.Models;

namespace DesignCompiler.Rendering.Workbook;

/// <summary>The line that traces a printed or returned sheet back to its design, seed and trialc version.</summary>
internal static class SheetTrace
{
    public static string Line(SheetModel model) =>
        $"design {model.DesignHashShort} · seed {model.Seed} · policy {model.Policy} · trialc {model.ToolVersion}"
        + (model.DateIssued == "" ? "" : " · issued " + model.DateIssued);
}
