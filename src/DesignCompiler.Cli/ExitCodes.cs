namespace DesignCompiler.Cli;

/// <summary>What trialc's exit status means, for scripts.</summary>
public static class ExitCodes
{
    /// <summary>Done; warnings may have been printed.</summary>
    public const int Ok = 0;

    /// <summary>The input had errors (design, results or ledger); nothing was written.</summary>
    public const int InputErrors = 1;

    /// <summary>The command line itself was wrong.</summary>
    public const int Usage = 2;

    /// <summary>A bug in trialc; the message asks for a report.</summary>
    public const int InternalError = 70;
}
