using DesignCompiler.Diagnostics;
using DesignCompiler.Syntax;

namespace DesignCompiler.Binding;

public sealed partial class DesignBinder
{
    /// <summary>The name of the single block that <c>plots N per round</c> stands for.</summary>
    public const string ImplicitBlockName = "field";


    private List<BlockSpec>? BindField(PlotsStatementSyntax? plots, IReadOnlyList<BlockStatementSyntax> blocks, DesignSyntax syntax)
    {
        if (plots is not null && blocks.Count > 0)
        {
            ReportWithHint(DiagnosticCatalog.PlotsAndBlocks, plots.Span,
                "keep the 'block' lines and remove 'plots N per round', or the other way round");
            return null;
        }

        if (plots is not null)
        {
            var count = Whole(plots.Count, "the plots per round", 1, DesignLimits.MaxPlotsPerRound);
            return count is null ? null : [new BlockSpec(0, ImplicitBlockName, count.Value, null, null, true, plots.Span)];
        }

        if (blocks.Count == 0)
        {
            if (IsBroken("block")) return null;
            ReportMissing("plots", "say how many plots each round has",
                "add 'plots 24 per round', or one line per block such as 'block north plots 20 layout 4 x 5'", syntax);
            return null;
        }

        if (blocks.Count > DesignLimits.MaxBlocks)
        {
            ReportWithHint(DiagnosticCatalog.OutOfRange, blocks[DesignLimits.MaxBlocks].Span,
                "merge neighbouring blocks, or split the field into several trials",
                "the number of blocks", FormattableString.Invariant($"at most {DesignLimits.MaxBlocks}"), blocks.Count);
            return null;
        }

        var result = new List<BlockSpec>();
        var firstByName = new Dictionary<string, BlockStatementSyntax>(StringComparer.Ordinal);
        var ok = true;
        foreach (var block in blocks)
        {
            if (firstByName.TryGetValue(block.Name.Name, out var first))
            {
                Report(DiagnosticCatalog.DuplicateBlock, block.Name.Span, block.Name.Name, LineOf(first.Span));
                ok = false;
                continue;
            }
            firstByName[block.Name.Name] = block;

            var count = Whole(block.Plots, "a block's plots", 1, DesignLimits.MaxPlotsPerBlock);
            int? rows = null, columns = null;
            if (block.Rows is not null && block.Columns is not null)
            {
                rows = Whole(block.Rows, "a layout's rows", 1, DesignLimits.MaxPlotsPerBlock);
                columns = Whole(block.Columns, "a layout's columns", 1, DesignLimits.MaxPlotsPerBlock);
                if (count is not null && rows is not null && columns is not null && (long)rows * columns != count)
                {
                    ReportWithHint(DiagnosticCatalog.LayoutMismatch, TextSpanOf(block.Rows, block.Columns),
                        FormattableString.Invariant($"make the layout hold {count} plots, or the block have {(long)rows * columns}"),
                        block.Name.Name, count, rows, columns, (long)rows * columns);
                    ok = false;
                }
            }
            if (count is null || (block.Rows is not null && (rows is null || columns is null)))
            {
                ok = false;
                continue;
            }
            result.Add(new BlockSpec(result.Count, block.Name.Name, count.Value, rows, columns, false, block.Span));
        }

        var total = result.Sum(b => (long)b.Plots);
        if (ok && total > DesignLimits.MaxPlotsPerRound)
        {
            Report(DiagnosticCatalog.OutOfRange, blocks[^1].Span, "the plots per round over all blocks",
                FormattableString.Invariant($"at most {DesignLimits.MaxPlotsPerRound}"), total);
            ok = false;
        }
        return ok ? result : null;
    }

    private static Text.TextSpan TextSpanOf(NumberSyntax first, NumberSyntax last) => first.Span.Cover(last.Span);
}
