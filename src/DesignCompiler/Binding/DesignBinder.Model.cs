using DesignCompiler.Diagnostics;
using DesignCompiler.Syntax;

namespace DesignCompiler.Binding;

public sealed partial class DesignBinder
{
    private static RoundingRule BindRounding(RoundingStatementSyntax? statement) =>
        statement?.Method.Keyword == "randomized" ? RoundingRule.Randomized : RoundingRule.LargestRemainder;

    private ModelSpec BindModel(ModelStatementSyntax? statement, OutcomeSpec? outcome, IReadOnlyList<BlockSpec>? blocks, int? rounds)
    {
        if (statement is null) return ModelSpec.Independent;
        var model = new ModelSpec(statement.AdjustsForBlock, statement.AdjustsForRound, statement.Span);
        if (!model.IsAdjusted) return model;
        if (outcome is not null && outcome.Family != OutcomeFamily.Normal)
        {
            ReportWithHint(DiagnosticCatalog.AdjustedModelNotNormal, statement.Span,
                "remove the line, or write 'model independent'", model.Describe(), outcome.FamilyText);
            return ModelSpec.Independent;
        }
        if (model.AdjustsForBlock && blocks is { Count: 1 })
            ReportWithHint(DiagnosticCatalog.AdjustedModelNothingToAdjust, statement.Span,
                "add blocks, or adjust only for round", model.Describe(), "block");
        else if (!model.AdjustsForBlock && rounds == 1)
            ReportWithHint(DiagnosticCatalog.AdjustedModelNothingToAdjust, statement.Span,
                "write 'model independent'", model.Describe(), "round");
        return model;
    }
}
