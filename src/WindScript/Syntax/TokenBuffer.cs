using System.Buffers;

namespace WindScript.Syntax;

/// <summary>
/// A growable token list on pooled arrays: a large file's tokens then cost one exact-size array,
/// not a chain of doubling copies on the large-object heap (which made the collector the main
/// cost of lexing big files).
/// </summary>
internal sealed class TokenBuffer(int capacity) : IDisposable
{
    private Token[] _items = ArrayPool<Token>.Shared.Rent(Math.Max(16, capacity));

    public int Count { get; private set; }

    public Token Last => _items[Count - 1];

    public void Add(Token token)
    {
        if (Count == _items.Length)
        {
            var bigger = ArrayPool<Token>.Shared.Rent(_items.Length * 2);
            _items.AsSpan(0, Count).CopyTo(bigger);
            ArrayPool<Token>.Shared.Return(_items, clearArray: true);
            _items = bigger;
        }
        _items[Count++] = token;
    }

    public Token[] ToArray() => _items.AsSpan(0, Count).ToArray();

    public void Dispose()
    {
        // Cleared so the pooled array does not keep this file's strings alive.
        ArrayPool<Token>.Shared.Return(_items, clearArray: true);
        _items = [];
    }
}
