using System.Security.Cryptography;
using System.Text;

namespace DesignCompiler.Binding;

/// <summary>The hash that ties every sheet and ledger entry to the exact design text it came from.</summary>
public static class DesignHash
{
    public static string Of(string text) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text)));
}
