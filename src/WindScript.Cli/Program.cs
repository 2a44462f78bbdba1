using WindScript.Cli;

return CliApp.Run(args, CliIO.Console);
