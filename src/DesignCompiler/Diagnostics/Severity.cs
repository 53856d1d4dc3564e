namespace DesignCompiler.Diagnostics;

public enum Severity
{
    Warning,
    Error,
}
