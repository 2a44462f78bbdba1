using System.Text;
using BenchmarkDotNet.Attributes;
using WindScript;
using WindScript.Syntax;

namespace WindScript.Benchmarks;

/// <summary>
/// Parse, and parse + evaluate + check, of a generated file with 10,000 explicit coils and of
/// every example. Throughput in MB/s = file size / mean time (sizes are printed at setup).
/// </summary>
[MemoryDiagnoser]
public class CompileBenchmarks
{
    private string _text = "";

    [ParamsSource(nameof(Inputs))]
    public string Input { get; set; } = "";

    public static IEnumerable<string> Inputs()
    {
        yield return "generated-10000-coils";
        foreach (var f in Directory.EnumerateFiles(ExamplesFolder(), "*.wind").Order(StringComparer.Ordinal))
            yield return Path.GetFileName(f);
    }

    [GlobalSetup]
    public void Setup()
    {
        _text = Input == "generated-10000-coils" ? TenThousandCoils() : File.ReadAllText(Path.Combine(ExamplesFolder(), Input));
        Console.WriteLine($"// {Input}: {_text.Length:N0} characters");
    }

    [Benchmark]
    public object Parse() => SyntaxTree.Parse(_text);   // object: the syntax tree is internal to the core

    [Benchmark]
    public Compilation ParseEvaluateCheck() => Compilation.Compile(_text);

    /// <summary>A balanced double-layer lap winding (q = 3, full pitch 9) of 10,008 coils written coil by coil.</summary>
    public static string TenThousandCoils()
    {
        const int slots = 10_008, poles = 1_112;
        string[] belts = ["U", "-W", "V", "-U", "W", "-V"];
        var sb = new StringBuilder();
        sb.Append($"machine generated {{\n  slots {slots}\n  poles {poles}\n  phases U V W\n}}\n\nwinding lap {{\n  layers 2\n  turns 3\n");
        for (int s = 1; s <= slots; s++)
            sb.Append($"  coil {belts[(s - 1) / 3 % 6]}: {s} -> {(s - 1 + 9) % slots + 1}\n");
        sb.Append("}\n");
        return sb.ToString();
    }

    private static string ExamplesFolder()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !Directory.Exists(Path.Combine(dir.FullName, "examples"))) dir = dir.Parent;
        return Path.Combine(dir?.FullName ?? ".", "examples");
    }
}
