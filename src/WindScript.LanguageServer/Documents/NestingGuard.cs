namespace WindScript.LanguageServer.Documents;

/// <summary>
/// The parser and evaluator recurse once per nested bracket, and a stack overflow cannot be
/// caught in .NET: it would end the server. A text nested deeper than any real winding file is
/// therefore not compiled; the user gets one diagnostic saying why.
/// </summary>
public static class NestingGuard
{
    /// <summary>Far beyond any real file; well within the server thread's stack (see LanguageServer).</summary>
    public const int MaxDepth = 2_000;

    public static bool TooDeep(string text)
    {
        int depth = 0;
        bool comment = false;
        foreach (char c in text)
        {
            switch (c)
            {
                case '#': comment = true; break;
                case '\n': comment = false; break;
                case '(' or '{' when !comment:
                    if (++depth > MaxDepth) return true;
                    break;
                case ')' or '}' when !comment:
                    depth = Math.Max(0, depth - 1);
                    break;
            }
        }
        return false;
    }
}
