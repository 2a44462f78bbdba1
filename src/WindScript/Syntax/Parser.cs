using System.Globalization;
using Pidgin;
using Pidgin.Expression;
using WindScript.Text;
using static Pidgin.Parser;
using static Pidgin.Parser<WindScript.Syntax.Token>;

namespace WindScript.Syntax;

/// <summary>
/// The grammar of WindScript (grammar/windscript.ebnf is the normative text) as Pidgin parsers
/// over tokens. Parsing never fails: a statement that does not parse becomes an
/// <see cref="ErrorStatementSyntax"/> carrying its message, and the parser resumes at the next
/// line (skipping a whole braced body if the bad line opened one), so every independent
/// mistake in a file is reported once and nothing cascades.
/// </summary>
internal static class Parser
{
    public static CompilationUnitSyntax ParseTokens(Token[] tokens)
    {
        var result = File.Parse(tokens);
        // The file parser cannot fail (every statement recovers), but stay total regardless.
        var unit = result.Success
            ? result.Value
            : new CompilationUnitSyntax([new PendingErrorSyntax(0, tokens.Length, [])], new TextSpan(0, tokens[^1].Span.End));
        // Recovery only knows token positions; give each broken line its tokens now.
        return ErrorStatements.Resolve(unit, tokens);
    }

    // ---- tokens ---------------------------------------------------------------------------

    private static Parser<Token, Token> Kind(TokenKind kind, string label) => Token(t => t.Kind == kind).Labelled(label);

    private static Parser<Token, Token> Keyword(string word) => Token(t => t.Kind == TokenKind.Word && t.Text == word).Labelled($"'{word}'");

    private static Parser<Token, Token> KeywordIn(IReadOnlySet<string> words, string label) =>
        Token(t => t.Kind == TokenKind.Word && words.Contains(t.Text)).Labelled(label);

    private static readonly Parser<Token, Token> NewLine = Kind(TokenKind.NewLine, "end of line");
    private static readonly Parser<Token, Token> LBrace = Kind(TokenKind.LBrace, "'{'");
    private static readonly Parser<Token, Token> RBrace = Kind(TokenKind.RBrace, "'}'");
    private static readonly Parser<Token, Token> LParen = Kind(TokenKind.LParen, "'('");
    private static readonly Parser<Token, Token> RParen = Kind(TokenKind.RParen, "')'");
    private static readonly Parser<Token, Token> Colon = Kind(TokenKind.Colon, "':'");
    private static readonly Parser<Token, Token> Comma = Kind(TokenKind.Comma, "','");
    private static readonly Parser<Token, Token> EqualsSign = Kind(TokenKind.Equals, "'='");
    private static readonly Parser<Token, Token> Arrow = Kind(TokenKind.Arrow, "'->'");
    private static readonly Parser<Token, Token> DotDot = Kind(TokenKind.DotDot, "'..'");
    private static readonly Parser<Token, Token> Minus = Kind(TokenKind.Minus, "'-'");
    private static readonly Parser<Token, Token> Plus = Kind(TokenKind.Plus, "'+'");

    private static readonly Parser<Token, NameSyntax> Name =
        Token(t => t.Kind == TokenKind.Word && !Vocabulary.IsReserved(t.Text)).Labelled("a name").Select(NameSyntax.From);

    private static readonly Parser<Token, Unit> EndOfStatement = OneOf(
        NewLine.IgnoreResult(),
        Lookahead(RBrace).IgnoreResult(),
        Lookahead(Kind(TokenKind.End, "end of file")).IgnoreResult()).Labelled("end of line");

    // ---- expressions ----------------------------------------------------------------------

    private static readonly Parser<Token, ExpressionSyntax> NumberLiteral = Map(
        (number, unit) => (ExpressionSyntax)new NumberSyntax(
            double.Parse(number.Text, NumberStyles.Float, CultureInfo.InvariantCulture),
            number.Text,
            unit.HasValue ? KeywordSyntax.From(unit.Value) : null,
            unit.HasValue ? number.Span.Cover(unit.Value.Span) : number.Span),
        Kind(TokenKind.Number, "a number"),
        Kind(TokenKind.Unit, "a unit").Optional());

    private static readonly Parser<Token, ExpressionSyntax> Expression = Rec(() => ExpressionRule!);

    private static readonly Parser<Token, ExpressionSyntax> NameOrCall = Map(
        (name, args) => args.HasValue
            ? new CallExpressionSyntax(name, args.Value.Items, name.Span.Cover(args.Value.Close.Span))
            : (ExpressionSyntax)new NameExpressionSyntax(name),
        Name,
        Map((_, items, close) => (Items: (IReadOnlyList<ExpressionSyntax>)items.ToArray(), Close: close),
            LParen, Expression.Separated(Comma), RParen).Optional());

    private static readonly Parser<Token, ExpressionSyntax> Parenthesized = Map(
        (open, inner, close) => (ExpressionSyntax)new ParenthesizedExpressionSyntax(inner, open.Span.Cover(close.Span)),
        LParen, Expression, RParen);

    private static readonly Parser<Token, ExpressionSyntax> Primary =
        OneOf(NumberLiteral, NameOrCall, Parenthesized).Labelled("a value");

    private static Parser<Token, Func<ExpressionSyntax, ExpressionSyntax, ExpressionSyntax>> Binary(TokenKind kind, string label) =>
        Kind(kind, label).Select<Func<ExpressionSyntax, ExpressionSyntax, ExpressionSyntax>>(_ => (l, r) => new BinaryExpressionSyntax(kind, l, r));

    private static readonly Parser<Token, ExpressionSyntax> ExpressionRule = ExpressionParser.Build(
        Primary,
        [
            Operator.Prefix(Minus.Select<Func<ExpressionSyntax, ExpressionSyntax>>(t => e => new UnaryExpressionSyntax(TokenKind.Minus, e, t.Span.Cover(e.Span)))),
            Operator.InfixL(Binary(TokenKind.Star, "'*'").Or(Binary(TokenKind.Slash, "'/'")).Or(Binary(TokenKind.Percent, "'%'"))),
            Operator.InfixL(Binary(TokenKind.Plus, "'+'").Or(Binary(TokenKind.Minus, "'-'"))),
        ]);

    /// <summary>A single value with an optional sign: used inside waveform terms, where '+' joins terms.</summary>
    private static readonly Parser<Token, ExpressionSyntax> SignedPrimary = Map(
        (sign, value) => sign.HasValue ? new UnaryExpressionSyntax(TokenKind.Minus, value, sign.Value.Span.Cover(value.Span)) : value,
        Minus.Optional(), Primary);

    // ---- statements -----------------------------------------------------------------------

    private static readonly Parser<Token, StatementSyntax> Let = Map(
        (kw, name, _, value) => (StatementSyntax)new LetSyntax(KeywordSyntax.From(kw), name, value, kw.Span.Cover(value.Span)),
        Keyword(Vocabulary.Let), Name, EqualsSign, Expression);

    private static readonly Parser<Token, StatementSyntax> Property = Map(
        (kw, value) => (StatementSyntax)new PropertySyntax(KeywordSyntax.From(kw), value, kw.Span.Cover(value.Span)),
        KeywordIn(Vocabulary.PropertyWords, "a property such as slots, turns or pitch"), Expression);

    private static readonly Parser<Token, StatementSyntax> Phases = Map(
        (kw, names) =>
        {
            var list = names.ToArray();
            return (StatementSyntax)new PhasesSyntax(KeywordSyntax.From(kw), list, kw.Span.Cover(list[^1].Span));
        },
        Keyword(Vocabulary.PhasesWord), Name.AtLeastOnce());

    private static readonly Parser<Token, StatementSyntax> Flag =
        KeywordIn(Vocabulary.FlagWords, $"'{Vocabulary.Neutral}'").Select(kw => (StatementSyntax)new FlagSyntax(KeywordSyntax.From(kw), kw.Span));

    private static readonly Parser<Token, PatternEntrySyntax> PatternEntry = OneOf(
        Token(t => t.Kind == TokenKind.Word && t.Text == Vocabulary.EmptySlot).Select(t => new PatternEntrySyntax(null, null, t.Span)),
        Map((sign, name) => new PatternEntrySyntax(sign.HasValue ? sign.Value : null, name,
                sign.HasValue ? sign.Value.Span.Cover(name.Span) : name.Span),
            Minus.Or(Plus).Optional(), Name)).Labelled("a phase such as U or -U, or '_'");

    private static readonly Parser<Token, StatementSyntax> Pattern = Map(
        (head, entries, repeat) =>
        {
            var list = entries.ToArray();
            var end = repeat.HasValue ? repeat.Value.Span : list.Length > 0 ? list[^1].Span : head.Colon.Span;
            return (StatementSyntax)new PatternSyntax(KeywordSyntax.From(head.Layer), list, repeat.GetValueOrDefault(), head.Layer.Span.Cover(end));
        },
        Try(Map((layer, colon) => (Layer: layer, Colon: colon), KeywordIn(Vocabulary.LayerWords, "a layer such as top"), Colon)),
        PatternEntry.Many(),
        Keyword(Vocabulary.Repeat).Then(Expression).Optional());

    private static readonly Parser<Token, KeywordSyntax> CoilLayerWord =
        Keyword(Vocabulary.Word(LayerName.Top)).Or(Keyword(Vocabulary.Word(LayerName.Bottom))).Labelled("'top' or 'bottom'").Select(KeywordSyntax.From);

    private static readonly Parser<Token, CoilOptionSyntax> CoilOption = OneOf(
        Map((kw, e) => (CoilOptionSyntax)new CoilTurnsSyntax(KeywordSyntax.From(kw), e, kw.Span.Cover(e.Span)), Keyword(Vocabulary.Word(PropertyName.Turns)), Expression),
        Map((kw, l) => (CoilOptionSyntax)new CoilLayerSyntax(KeywordSyntax.From(kw), l, kw.Span.Cover(l.Span)), Keyword(Vocabulary.Layer), CoilLayerWord));

    private static readonly Parser<Token, StatementSyntax> Coil = Map(
        (kw, sign, phase, go, ret, options) =>
        {
            var opts = options.ToArray();
            var end = opts.Length > 0 ? opts[^1].Span : ret.Span;
            return (StatementSyntax)new CoilSyntax(KeywordSyntax.From(kw), sign.HasValue ? sign.Value : null, phase, go, ret, opts, kw.Span.Cover(end));
        },
        Keyword(Vocabulary.Coil),
        Minus.Optional(),
        Name.Before(Colon),
        Expression.Before(Arrow),
        Expression,
        CoilOption.Many());

    private static readonly Parser<Token, SineTermSyntax> Sine = Map(
        (kw, amplitude, measure, _, frequency, phase) => new SineTermSyntax(KeywordSyntax.From(kw), amplitude, KeywordSyntax.From(measure), frequency, phase.GetValueOrDefault(),
            kw.Span.Cover(phase.HasValue ? phase.Value.Span : frequency.Span)),
        Keyword(Vocabulary.Sine),
        SignedPrimary,
        KeywordIn(Vocabulary.MeasureWords, "'peak' or 'rms'"),
        Keyword(Vocabulary.At),
        SignedPrimary,
        Keyword(Vocabulary.Phase).Then(SignedPrimary).Optional());

    private static readonly Parser<Token, WaveTermSyntax> Dc = Map(
        (kw, value) => (WaveTermSyntax)new DcTermSyntax(KeywordSyntax.From(kw), value, kw.Span.Cover(value.Span)), Keyword(Vocabulary.Dc), SignedPrimary);

    private static readonly Parser<Token, WaveTermSyntax> WaveTerm =
        OneOf(Sine.Select(s => (WaveTermSyntax)s), Dc);

    private static readonly Parser<Token, StatementSyntax> PhaseCurrent = Map(
        (head, first, rest) =>
        {
            var terms = new List<SignedTermSyntax> { new(false, first, first.Span) };
            terms.AddRange(rest);
            return (StatementSyntax)new PhaseCurrentSyntax(head, terms, head.Span.Cover(terms[^1].Span));
        },
        Try(Name.Before(EqualsSign)),
        WaveTerm,
        Map((op, term) => new SignedTermSyntax(op.Kind == TokenKind.Minus, term, op.Span.Cover(term.Span)), Plus.Or(Minus), WaveTerm).Many());

    private static readonly Parser<Token, StatementSyntax> Balanced = Map(
        (kw, wave, seqKw, names) =>
        {
            var list = names.ToArray();
            return (StatementSyntax)new BalancedSyntax(KeywordSyntax.From(kw), wave, KeywordSyntax.From(seqKw), list, kw.Span.Cover(list[^1].Span));
        },
        Keyword(Vocabulary.Balanced), Sine, Keyword(Vocabulary.Sequence), Name.AtLeastOnce());

    private static readonly Parser<Token, StatementSyntax> Statement = Rec(() => StatementRule!);

    private static readonly Parser<Token, (IReadOnlyList<StatementSyntax> Body, bool Closed, TextSpan End)> Body = Map(
        (open, statements, close) => ((IReadOnlyList<StatementSyntax>)statements.ToArray(), close.HasValue,
            close.HasValue ? close.Value.Span : statements.LastOrDefault()?.Span ?? open.Span),
        LBrace.Before(NewLine.SkipMany()),
        Statement.Many(),
        RBrace.Optional());

    // A block without a name still parses (its body is bound and checked); the missing name is
    // reported once, at its place, from the tree.
    private static readonly Parser<Token, NameSyntax> BlockName =
        Name.Or(Lookahead(LBrace).Select(brace => NameSyntax.Missing(brace.Span.Start))).Labelled("a name");

    private static readonly Parser<Token, StatementSyntax> Block = Map(
        (kw, name, body) => (StatementSyntax)new BlockSyntax(KeywordSyntax.From(kw), name, body.Body, body.Closed, kw.Span.Cover(body.End)),
        KeywordIn(Vocabulary.BlockWords, "a block such as machine, winding or drive"),
        BlockName,
        Body);


    private static readonly Parser<Token, StatementSyntax> For = Map(
        (kw, variable, from, to, step, body) =>
            (StatementSyntax)new ForSyntax(KeywordSyntax.From(kw), variable, from, to, step.GetValueOrDefault(), body.Body, body.Closed, kw.Span.Cover(body.End)),
        Keyword(Vocabulary.For),
        Name.Before(Keyword(Vocabulary.In)),
        Expression.Before(DotDot),
        Expression,
        Keyword(Vocabulary.Step).Then(Expression).Optional(),
        Body);

    private static readonly Parser<Token, StatementSyntax> AnyStatement = OneOf(
        Let, Pattern, Property, Phases, Flag, Block, For, Coil, Balanced, PhaseCurrent);

    private static readonly Parser<Token, StatementSyntax> PatternOrProperty = Pattern.Or(Property);

    // The first token decides the statement, so a line costs one dictionary look-up instead of
    // trying every alternative; anything else gets the full list of what could start a line.
    private static readonly Dictionary<string, Parser<Token, StatementSyntax>> ByKeyword = BuildDispatch();

    private static Dictionary<string, Parser<Token, StatementSyntax>> BuildDispatch()
    {
        var table = new Dictionary<string, Parser<Token, StatementSyntax>>(StringComparer.Ordinal)
        {
            [Vocabulary.Let] = Let,
            [Vocabulary.PhasesWord] = Phases,
            [Vocabulary.For] = For,
            [Vocabulary.Coil] = Coil,
            [Vocabulary.Balanced] = Balanced,
        };
        foreach (var word in Vocabulary.BlockWords) table[word] = Block;
        foreach (var word in Vocabulary.FlagWords) table[word] = Flag;
        foreach (var word in Vocabulary.PropertyWords) table[word] = Property;
        foreach (var word in Vocabulary.LayerWords) table[word] = Vocabulary.PropertyWords.Contains(word) ? PatternOrProperty : Pattern;
        return table;
    }

    private static readonly Parser<Token, StatementSyntax> StatementCore =
        Lookahead(Any).Then(first => first.Kind != TokenKind.Word
            ? AnyStatement
            : ByKeyword.TryGetValue(first.Text, out var parser) ? parser
            : Vocabulary.IsReserved(first.Text) ? AnyStatement : PhaseCurrent);

    // Skips the rest of a broken statement: to the end of its line, or over a whole braced
    // body if the line opened one, so the body's lines are not misread as outer statements.
    private static readonly Parser<Token, Unit> SkipBraced = Rec(() =>
        LBrace.Then(OneOf(SkipBraced!, Token(t => t.Kind is not (TokenKind.RBrace or TokenKind.End or TokenKind.LBrace)).IgnoreResult()).SkipMany())
            .Then(RBrace.Optional()).IgnoreResult());

    private static readonly Parser<Token, Unit> SkipLine =
        OneOf(SkipBraced, Token(t => t.Kind is not (TokenKind.NewLine or TokenKind.RBrace or TokenKind.End or TokenKind.LBrace)).IgnoreResult())
            .SkipMany()
            .Then(NewLine.SkipMany());

    private static readonly Parser<Token, StatementSyntax> StatementRule =
        Lookahead(Token(t => t.Kind is not (TokenKind.RBrace or TokenKind.End)))
            .Then(StatementCore.Before(EndOfStatement).Before(NewLine.SkipMany())
                .RecoverWith(error => SkipLine.Then(CurrentOffset).Select(end => (StatementSyntax)new PendingErrorSyntax(error.ErrorOffset, end, ExpectedLabels(error)))));

    // A '}' with no block to close, at top level.
    private static readonly Parser<Token, StatementSyntax> StrayBrace =
        RBrace.Before(NewLine.SkipMany()).Select(t => (StatementSyntax)new ErrorStatementSyntax(SyntaxErrorKind.StrayBrace, [t], 0, [], t.Span, t.Span));

    private static readonly Parser<Token, CompilationUnitSyntax> File = Map(
        (items, end) => new CompilationUnitSyntax(items.ToArray(), new TextSpan(0, end.Span.End)),
        NewLine.SkipMany().Then(OneOf(Statement, StrayBrace).Many()),
        Kind(TokenKind.End, "end of file"));

    private static string[] ExpectedLabels(ParseError<Token> error) => error.Expected
        .Select(e => e.Label ?? (e.Tokens.IsDefaultOrEmpty ? null : string.Join(" ", e.Tokens.Select(t => t.ToString()))))
        .Where(l => !string.IsNullOrEmpty(l))
        .Distinct()
        .ToArray()!;
}
