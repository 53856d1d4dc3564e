using DesignCompiler.Cli;

return TrialcApp.Run(args, Console.Out, Console.Error);
