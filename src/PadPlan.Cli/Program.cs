return PadPlan.Cli.PadPlanCli.Run(args, Console.Out, Console.Error, errIsTerminal: !Console.IsErrorRedirected,
    columns: PadPlan.Cli.TerminalWidth.Resolve(Environment.GetEnvironmentVariable("COLUMNS"), PadPlan.Cli.TerminalWidth.Console()));
