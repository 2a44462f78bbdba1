using System.Text;

namespace WindScript.Cli;

/// <summary>Writes a file so that it is either fully replaced or left untouched: temp file, then rename.</summary>
public static class AtomicFile
{
    public static void WriteAllText(string path, string text) => WriteAllBytes(path, new UTF8Encoding(false).GetBytes(text));

    public static void WriteAllBytes(string path, byte[] bytes)
    {
        var full = System.IO.Path.GetFullPath(path);
        var dir = System.IO.Path.GetDirectoryName(full)!;
        var temp = System.IO.Path.Combine(dir, $".{System.IO.Path.GetFileName(full)}.{Environment.ProcessId}.tmp");
        try
        {
            File.WriteAllBytes(temp, bytes);
            File.Move(temp, full, overwrite: true);
        }
        finally
        {
            if (File.Exists(temp)) File.Delete(temp);
        }
    }
}
