using WindScript.Syntax;

namespace WindScript.Emit;

/// <summary>Makes names safe to write: a word the lexer reads as one name and the language does not reserve.</summary>
internal static class SourceNames
{
    public static string Safe(string name, string fallback)
    {
        if (string.IsNullOrEmpty(name)) return fallback;
        var chars = name.Select(c => Lexer.IsWordPart(c) ? c : '_').ToArray();
        var text = new string(chars);
        if (!Lexer.IsWordStart(text[0])) text = "_" + text;
        if (text == "_" || Vocabulary.IsReserved(text)) text += "_";
        return text;
    }
}
