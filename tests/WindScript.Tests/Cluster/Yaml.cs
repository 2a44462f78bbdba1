using YamlDotNet.RepresentationModel;

namespace WindScript.Tests.Cluster;

/// <summary>Small helpers over YamlDotNet's representation model: read a job file without binding it to our own types.</summary>
internal static class Yaml
{
    public static IReadOnlyList<YamlNode> Documents(string path)
    {
        var stream = new YamlStream();
        stream.Load(new StringReader(File.ReadAllText(path)));   // throws on YAML that is not well formed
        return stream.Documents.Select(d => d.RootNode).ToList();
    }

    public static YamlNode At(this YamlNode node, params string[] keys)
    {
        foreach (var key in keys)
        {
            var map = Assert.IsType<YamlMappingNode>(node);
            Assert.True(map.Children.TryGetValue(new YamlScalarNode(key), out var child), $"'{key}' is missing at line {node.Start.Line}");
            node = child!;
        }
        return node;
    }

    public static bool Has(this YamlNode node, string key) => node is YamlMappingNode map && map.Children.ContainsKey(new YamlScalarNode(key));

    public static string Text(this YamlNode node) => Assert.IsType<YamlScalarNode>(node).Value ?? "";

    public static int Int(this YamlNode node) => int.Parse(node.Text(), System.Globalization.CultureInfo.InvariantCulture);

    public static IReadOnlyList<YamlNode> Items(this YamlNode node) => Assert.IsType<YamlSequenceNode>(node).Children.ToList();

    /// <summary>The entries of a mapping whose values are scalars.</summary>
    public static IEnumerable<KeyValuePair<string, string>> Entries(this YamlNode node) =>
        Assert.IsType<YamlMappingNode>(node).Children.Select(c => new KeyValuePair<string, string>(c.Key.Text(), c.Value.Text()));
}
