using System.Diagnostics;

namespace WindScript.Cli.Output;

/// <summary>A one-line progress bar redrawn in place on standard error (use only when it is a terminal).</summary>
public sealed class ProgressBar(TextWriter err, long total, string label)
{
    private const int Width = 30;
    private readonly Stopwatch _clock = Stopwatch.StartNew();
    private long _lastDraw = -1000;

    public void Report(long done)
    {
        long now = _clock.ElapsedMilliseconds;
        if (now - _lastDraw < 100 && done < total) return;
        _lastDraw = now;
        double fraction = total <= 0 ? 1 : Math.Min(1, (double)done / total);
        int filled = (int)Math.Round(fraction * Width);
        err.Write($"\r{label} [{new string('#', filled)}{new string(' ', Width - filled)}] {fraction * 100,3:0}% {done}/{total}");
        err.Flush();
    }

    /// <summary>Clears the line so that what follows starts clean.</summary>
    public void Finish()
    {
        err.Write("\r" + new string(' ', label.Length + Width + 32) + "\r");
        err.Flush();
    }
}
