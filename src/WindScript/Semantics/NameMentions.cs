using System.Collections;
using System.Diagnostics.CodeAnalysis;
using System.Reflection;
using WindScript.Syntax;

namespace WindScript.Semantics;

/// <summary>
/// Every name the source mentions as a value, anywhere in the tree, including inside statements
/// the binders refused (a misplaced block, a line that did not parse): a name used there counts
/// as used, so a refused statement gives its own diagnostic and no false "never used".
/// Walks the syntax records generically, so a new node type needs nothing here.
/// </summary>
internal static class NameMentions
{
    public static HashSet<string> Of(SyntaxTree tree)
    {
        var names = new HashSet<string>(StringComparer.Ordinal);
        Walk(tree.Root, names);
        return names;
    }

    // Reflection over the syntax records: the CLI roots the core assembly for trimming
    // (TrimmerRootAssembly), so every property is there in the Native AOT binary too.
    [UnconditionalSuppressMessage("Trimming", "IL2075", Justification = "WindScript.Core is a trimmer root assembly of every published binary.")]
    private static void Walk(object? node, HashSet<string> names)
    {
        switch (node)
        {
            case null:
                return;
            case NameExpressionSyntax name:
                names.Add(name.Name.Text);
                return;
            case Token { Kind: TokenKind.Word } token:
                names.Add(token.Text); // tokens kept by a broken line
                return;
            case string or Token:
                return;
            case IEnumerable items:
                foreach (var item in items) Walk(item, names);
                return;
            case SyntaxNode:
                foreach (var property in node.GetType().GetProperties(BindingFlags.Public | BindingFlags.Instance))
                {
                    if (property.GetIndexParameters().Length > 0 || property.Name == "EqualityContract") continue;
                    var t = property.PropertyType;
                    if (t.IsPrimitive || t.IsEnum || t == typeof(Text.TextSpan)) continue;
                    Walk(property.GetValue(node), names);
                }
                return;
        }
    }
}
