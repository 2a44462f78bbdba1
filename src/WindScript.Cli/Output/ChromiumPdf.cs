using System.Diagnostics;

namespace WindScript.Cli.Output;

/// <summary>
/// Prints an HTML page to PDF with a headless Chromium (Debian's chromium, or any Chrome/Chromium
/// the user names): the page is written to a private temporary folder, printed there with
/// --print-to-pdf, and the PDF's bytes returned, so the caller writes the real output atomically.
/// The browser gets no network and a throw-away profile.
/// </summary>
public static class ChromiumPdf
{
    /// <summary>The environment variable that names the browser when --browser is not given.</summary>
    public const string BrowserVariable = "WINDSCRIPT_BROWSER";

    private static readonly string[] Candidates = ["chromium", "chromium-browser", "google-chrome", "google-chrome-stable"];

    /// <summary>The browser to run: the one named, else $WINDSCRIPT_BROWSER, else the first Chromium on PATH; null if none.</summary>
    public static string? Find(string? named)
    {
        if (!string.IsNullOrEmpty(named)) return named;
        if (Environment.GetEnvironmentVariable(BrowserVariable) is { Length: > 0 } fromEnvironment) return fromEnvironment;
        foreach (var directory in (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries))
            foreach (var name in Candidates)
            {
                string candidate = Path.Combine(directory, name);
                if (File.Exists(candidate)) return candidate;
            }
        return null;
    }

    /// <summary>The PDF bytes, or null with the reason in <paramref name="error"/>.</summary>
    public static byte[]? Print(string browser, string html, TimeSpan timeout, out string error)
    {
        var work = Directory.CreateTempSubdirectory("windscript-pdf-");
        try
        {
            string page = Path.Combine(work.FullName, "sheet.html"), pdf = Path.Combine(work.FullName, "sheet.pdf");
            File.WriteAllText(page, html);
            var start = new ProcessStartInfo(browser)
            {
                RedirectStandardOutput = true,
                RedirectStandardError = true,
                UseShellExecute = false,
            };
            foreach (var arg in new[]
            {
                "--headless", "--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking",
                "--disable-component-update", "--disable-sync", "--disable-extensions", "--no-pdf-header-footer",
                $"--user-data-dir={Path.Combine(work.FullName, "profile")}", $"--print-to-pdf={pdf}", new Uri(page).AbsoluteUri,
            }) start.ArgumentList.Add(arg);
            Process process;
            try
            {
                process = Process.Start(start) ?? throw new InvalidOperationException();
            }
            catch (Exception e) when (e is System.ComponentModel.Win32Exception or InvalidOperationException)
            {
                error = $"cannot run the browser '{browser}' ({e.Message}); install chromium or name one with --browser";
                return null;
            }
            using (process)
            {
                var stderr = process.StandardError.ReadToEndAsync();
                _ = process.StandardOutput.ReadToEndAsync();
                if (!process.WaitForExit(timeout))
                {
                    process.Kill(entireProcessTree: true);
                    error = $"the browser '{browser}' did not finish printing within {timeout.TotalSeconds:0} s";
                    return null;
                }
                process.WaitForExit();
                byte[] bytes = File.Exists(pdf) ? File.ReadAllBytes(pdf) : [];
                if (bytes.Length < 5 || bytes[0] != '%' || bytes[1] != 'P' || bytes[2] != 'D' || bytes[3] != 'F')
                {
                    string said = stderr.Result.Trim().Split('\n').LastOrDefault(l => l.Trim().Length > 0)?.Trim() ?? "";
                    error = $"the browser '{browser}' exited {process.ExitCode} without writing a PDF" + (said.Length > 0 ? $": {said}" : "");
                    return null;
                }
                error = "";
                return bytes;
            }
        }
        finally
        {
            try { work.Delete(recursive: true); }
            catch (IOException) { }
            catch (UnauthorizedAccessException) { }
        }
    }
}
