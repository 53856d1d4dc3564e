using DesignCompiler.Binding;
using DesignCompiler.Text;

namespace DesignCompiler.Ledger;

/// <summary>
/// A design text kept in the ledger, checked again so a round can be re-issued or an amendment
/// compared under exactly the text it was issued with, whatever the design file says now.
/// </summary>
public static class StoredDesign
{
    public static CheckedDesign? Bind(LedgerHistory history, string hash, string pathForMessages)
    {
        var text = history.DesignText(hash);
        if (text is null) return null;
        return DesignBinder.Check(new SourceText(pathForMessages, text)).Design;
    }
}
