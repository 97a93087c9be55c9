return PadPlan.Cli.PadPlanCli.Run(args, Console.Out, Console.Error, errIsTerminal: !Console.IsErrorRedirected);
