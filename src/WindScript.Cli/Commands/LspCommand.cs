using System.CommandLine;

namespace WindScript.Cli.Commands;

/// <summary>
/// <c>windscript lsp</c>: serve the language server over standard input and output until the
/// editor says exit. Standard output then carries only protocol messages; logs go to stderr.
/// </summary>
public static class LspCommand
{
    public static Command Create(CliIO io)
    {
        // Editors' client libraries often pass --stdio; it is the only transport, so it is accepted and ignored.
        var stdio = new Option<bool>("--stdio") { Description = "Talk over standard input/output (the default and only transport)" };
        var command = new Command("lsp", "Run the WindScript language server (LSP 3.17 over stdio) for editors") { stdio };
        command.SetAction((_, cancel) => RunAsync(io, cancel));
        return command;
    }

    public static async Task<int> RunAsync(CliIO io, CancellationToken cancel)
    {
        using var input = Console.OpenStandardInput();
        using var output = Console.OpenStandardOutput();
        return await LanguageServer.LanguageServer.RunAsync(input, output, io.Err, cancel);
    }
}
