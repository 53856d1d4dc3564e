using System.Globalization;
using System.Reflection;
using Scriban;
using Scriban.Runtime;
using Scriban.Syntax;

namespace DesignCompiler.Rendering;

/// <summary>
/// The context every template renders in. A template may read the model and use Scriban's pure
/// functions (string, math, array, html, regex, date formatting) and nothing else: the functions
/// that read files (<c>include</c>), the clock (<c>date.now</c>), randomness (<c>math.random</c>,
/// <c>math.uuid</c>) or run text as a template (<c>object.eval</c>) are replaced by ones that stop
/// with a positioned error. .NET objects show their properties only, never methods or fields.
/// Loops, recursion, output and regular expressions run under limits, so a runaway template ends
/// in an error rather than a hung or exhausted machine.
/// </summary>
internal static class TemplateSandbox
{
    private static readonly (string Object, string Function, string Why)[] Refusals =
    [
        ("", "include", "it would read another file"),
        ("", "include_join", "it would read other files"),
        ("date", "now", "it would read the clock, and the same round must always give the same page; use date_issued"),
        ("date", "utc_now", "it would read the clock, and the same round must always give the same page; use date_issued"),
        ("math", "random", "it would make the page differ from run to run"),
        ("math", "uuid", "it would make the page differ from run to run"),
        ("object", "eval", "it would run text as template code"),
        ("object", "eval_template", "it would run text as template code"),
    ];

    public static TemplateContext Context(object model)
    {
        var globals = new ScriptObject();
        globals.Import(model, renamer: StandardMemberRenamer.Default);
        TemplateFunctions.AddTo(globals);

        var context = new TemplateContext
        {
            StrictVariables = true,
            LoopLimit = 2_000_000,
            RecursiveLimit = 50,
            ObjectRecursionLimit = 50,
            LimitToString = 64 * 1024 * 1024,
            OutputLimit = 64 * 1024 * 1024,
            RegexTimeOut = TimeSpan.FromSeconds(2),
            TemplateLoader = null,
            EnableRelaxedMemberAccess = false,
            MemberFilter = member => member is PropertyInfo,
            NewLine = "\n",
        };
        foreach (var (owner, name, why) in Refusals)
        {
            var target = owner.Length == 0 ? context.BuiltinObject : context.BuiltinObject[owner] as ScriptObject;
            target?.SetValue(name, new RefusedFunction(owner.Length == 0 ? name : owner + "." + name, why), true);
        }
        context.PushCulture(CultureInfo.InvariantCulture);
        context.PushGlobal(globals);
        return context;
    }

    /// <summary>A refused function: calling it stops the template at the call, saying why.</summary>
    private sealed class RefusedFunction(string name, string why) : IScriptCustomFunction
    {
        public int RequiredParameterCount => 0;
        public int ParameterCount => 0;
        public ScriptVarParamKind VarParamKind => ScriptVarParamKind.Direct;
        public Type ReturnType => typeof(object);

        public ScriptParameterInfo GetParameterInfo(int index) => new(typeof(object), "value");

        public object? Invoke(TemplateContext context, ScriptNode? callerContext, ScriptArray arguments, ScriptBlockStatement? blockStatement) =>
            throw new TemplateRefusal(callerContext?.Span ?? context.CurrentSpan, name, why);

        public ValueTask<object?> InvokeAsync(TemplateContext context, ScriptNode? callerContext, ScriptArray arguments, ScriptBlockStatement? blockStatement) =>
            throw new TemplateRefusal(callerContext?.Span ?? context.CurrentSpan, name, why);
    }
}

/// <summary>A template called a function trialc does not allow; carries the function's name and the reason.</summary>
internal sealed class TemplateRefusal(Scriban.Parsing.SourceSpan span, string function, string why)
    : ScriptRuntimeException(span, $"'{function}' is not available: {why}")
{
    public string Function { get; } = function;
    public string Why { get; } = why;
}
