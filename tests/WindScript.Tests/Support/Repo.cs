namespace WindScript.Tests.Support;

/// <summary>Paths inside the repository, found from the test binary's location.</summary>
public static class Repo
{
    public static string Root { get; } = FindRoot();

    public static string Examples => Path.Combine(Root, "examples");

    public static string Cases => Path.Combine(Root, "tests", "cases");

    public static string Baselines => Path.Combine(Root, "tests", "baselines");

    public static IEnumerable<string> ExampleFiles() => Directory.EnumerateFiles(Examples, "*.wind").Order(StringComparer.Ordinal);

    public static IEnumerable<string> CaseFiles() => Directory.EnumerateFiles(Cases, "*.wind").Order(StringComparer.Ordinal);

    /// <summary>Every example and test case, as paths relative to the repository root (theory data).</summary>
    public static TheoryData<string> ExamplesAndCases()
    {
        var data = new TheoryData<string>();
        foreach (var f in ExampleFiles().Concat(CaseFiles())) data.Add(Path.GetRelativePath(Root, f));
        return data;
    }

    private static string FindRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "WindScript.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("WindScript.sln not found above " + AppContext.BaseDirectory);
    }
}
