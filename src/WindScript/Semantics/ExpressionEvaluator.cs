using System.Globalization;
using WindScript.Diagnostics;
using WindScript.Syntax;
using WindScript.Text;
using WindScript.Units;

namespace WindScript.Semantics;

/// <summary>
/// Evaluates expressions to quantities with dimensions. A failed evaluation reports once and
/// yields null; callers skip what depends on it, so one mistake gives one diagnostic.
/// </summary>
/// <summary>Which angle a property means: electrical (θ_e = p·θ_m, phase shifts and time phases) or mechanical (around the bore).</summary>
internal enum AngleKind { Electrical, Mechanical }

internal sealed class ExpressionEvaluator(DiagnosticBag diagnostics)
{
    /// <summary>Slot count for wrap(); 0 until the machine is known.</summary>
    public int Slots { get; set; }

    /// <summary>Pole pairs for electrical() and mechanical(); 0 until the machine's poles are known.</summary>
    public int PolePairs { get; set; }

    // The kind of angle the property being evaluated expects (null outside angle properties).
    private AngleKind? _angleContext;

    /// <summary>
    /// Evaluates an angle property that is electrical or mechanical by definition. Inside it,
    /// electrical(x) and mechanical(x) state the kind of x and convert it through the pole pairs
    /// (θ_electrical = p·θ_mechanical); a bare angle is taken as the property's own kind.
    /// </summary>
    public double? EvaluateAngle(ExpressionSyntax expression, Scope scope, AngleKind kind, string what)
    {
        var saved = _angleContext;
        _angleContext = kind;
        try { return EvaluateAs(expression, scope, Dimension.AngleDim, what); }
        finally { _angleContext = saved; }
    }

    /// <summary>As <see cref="Evaluate"/>, inside an angle property of the given kind.</summary>
    public Quantity? EvaluateInAngleContext(ExpressionSyntax expression, Scope scope, AngleKind kind)
    {
        var saved = _angleContext;
        _angleContext = kind;
        try { return Evaluate(expression, scope); }
        finally { _angleContext = saved; }
    }

    /// <summary>The value, or null after one diagnostic; never infinite or NaN (WS2042 at the first place that would be).</summary>
    public Quantity? Evaluate(ExpressionSyntax expression, Scope scope)
    {
        var value = EvaluateAny(expression, scope);
        if (value is { } q && !double.IsFinite(q.Value))
        {
            diagnostics.Add(DiagnosticCatalog.NumberOutOfRange, expression.Span, expression is NumberSyntax n
                ? $"{n.Literal}{(n.Unit is null ? "" : " " + n.Unit.Text)} is beyond the range of numbers (about ±1.8e308)"
                : "the result is beyond the range of numbers (about ±1.8e308) or undefined");
            return null;
        }
        return value;
    }

    private Quantity? EvaluateAny(ExpressionSyntax expression, Scope scope)
    {
        switch (expression)
        {
            case NumberSyntax number:
                if (number.Unit is null) return Quantity.Plain(number.Value);
                var unit = UnitTable.Find(number.Unit.Text)!;
                return new Quantity(number.Value * unit.ToSi, unit.Dimension);

            case NameExpressionSyntax name:
                return EvaluateName(name.Name, scope);

            case ParenthesizedExpressionSyntax paren:
                return Evaluate(paren.Inner, scope);

            case UnaryExpressionSyntax unary:
                return Evaluate(unary.Operand, scope) is { } operand ? operand with { Value = -operand.Value } : null;

            case BinaryExpressionSyntax binary:
                return EvaluateBinary(binary, scope);

            case CallExpressionSyntax call:
                return EvaluateCall(call, scope);

            default:
                return null;
        }
    }

    private Quantity? EvaluateName(NameSyntax name, Scope scope)
    {
        var symbol = scope.Lookup(name.Text);
        if (symbol is null)
        {
            diagnostics.Add(DiagnosticCatalog.UndefinedName, name.Span, $"'{name.Text}' is not defined");
            return null;
        }
        symbol.AddReference(name.Span);
        if (symbol.Kind == SymbolKind.LoopVariable)
            return scope.TryGetLoopValue(name.Text, out double v) ? Quantity.Plain(v) : null;
        if (symbol.Kind != SymbolKind.Value)
        {
            diagnostics.Add(DiagnosticCatalog.WrongDimension, name.Span, $"'{name.Text}' names a {symbol.Kind.ToString().ToLowerInvariant()}, not a value");
            return null;
        }
        return symbol.Value;
    }

    /// <summary>
    /// A chain like 1 + 2 - 3 * 4 ... is a left-deep tree: walk its left spine in a loop, so the
    /// stack grows with bracket nesting (at most <see cref="Syntax.SyntaxTree.MaxNesting"/>), never with the chain's length.
    /// </summary>
    private Quantity? EvaluateBinary(BinaryExpressionSyntax binary, Scope scope)
    {
        var spine = new Stack<BinaryExpressionSyntax>();
        ExpressionSyntax leftmost = binary;
        while (leftmost is BinaryExpressionSyntax b)
        {
            spine.Push(b);
            leftmost = b.Left;
        }
        var value = Evaluate(leftmost, scope);
        bool failed = value is null;
        while (spine.Count > 0)
        {
            var node = spine.Pop();
            // Every right operand is evaluated (and reports its own problems) even after a failure.
            var right = Evaluate(node.Right, scope);
            if (failed || right is null)
            {
                failed = true;
                continue;
            }
            value = Apply(node, value!.Value, right.Value);
            if (value is null) failed = true;
            else if (spine.Count > 0 && !double.IsFinite(value.Value.Value))
            {
                diagnostics.Add(DiagnosticCatalog.NumberOutOfRange, node.Span, "the result is beyond the range of numbers (about ±1.8e308) or undefined");
                failed = true;
            }
        }
        return failed ? null : value;
    }

    private Quantity? Apply(BinaryExpressionSyntax binary, Quantity l, Quantity r)
    {
        switch (binary.Operator)
        {
            case TokenKind.Plus:
            case TokenKind.Minus:
                if (l.Dimension != r.Dimension)
                {
                    diagnostics.Add(DiagnosticCatalog.InvalidArithmetic, binary.Span,
                        $"cannot {(binary.Operator == TokenKind.Plus ? "add" : "subtract")} {r.Dimension.Describe()} {(binary.Operator == TokenKind.Plus ? "to" : "from")} {l.Dimension.Describe()}");
                    return null;
                }
                return new Quantity(binary.Operator == TokenKind.Plus ? l.Value + r.Value : l.Value - r.Value, l.Dimension);
            case TokenKind.Star:
                return new Quantity(l.Value * r.Value, l.Dimension * r.Dimension);
            case TokenKind.Slash:
                if (r.Value == 0)
                {
                    diagnostics.Add(DiagnosticCatalog.InvalidArithmetic, binary.Right.Span, "division by zero");
                    return null;
                }
                return new Quantity(l.Value / r.Value, l.Dimension / r.Dimension);
            case TokenKind.Percent:
                if (!l.Dimension.IsNone || !r.Dimension.IsNone || r.Value == 0)
                {
                    diagnostics.Add(DiagnosticCatalog.InvalidArithmetic, binary.Span, "'%' takes two plain numbers and a non-zero divisor");
                    return null;
                }
                // A mathematical modulo: the result has the sign of the divisor, so (k - 1) % 36 >= 0.
                double m = l.Value % r.Value;
                if (m != 0 && (m < 0) != (r.Value < 0)) m += r.Value;
                return Quantity.Plain(m);
            default:
                return null;
        }
    }

    private Quantity? EvaluateCall(CallExpressionSyntax call, Scope scope)
    {
        var args = new Quantity[call.Arguments.Count];
        bool ok = true;
        for (int i = 0; i < args.Length; i++)
        {
            if (Evaluate(call.Arguments[i], scope) is { } q) args[i] = q; else ok = false;
        }
        string f = call.Function.Text;
        int? arity = Vocabulary.Function(f)?.Arity;
        if (arity is null)
        {
            diagnostics.Add(DiagnosticCatalog.UnknownFunction, call.Function.Span, $"there is no function '{f}'");
            return null;
        }
        if (args.Length != arity)
        {
            diagnostics.Add(DiagnosticCatalog.InvalidArithmetic, call.Span, $"{f} takes {arity} argument{(arity == 1 ? "" : "s")}, not {args.Length}");
            return null;
        }
        if (!ok) return null;
        var a = args[0];
        switch (f)
        {
            case "wrap":
                if (!a.Dimension.IsNone || Slots <= 0)
                {
                    diagnostics.Add(DiagnosticCatalog.InvalidArithmetic, call.Span, Slots <= 0 ? "wrap() needs the machine's slot count" : "wrap() takes a plain slot number");
                    return null;
                }
                double w = (a.Value - 1) % Slots;
                if (w < 0) w += Slots;
                return Quantity.Plain(w + 1);
            case "electrical" or "mechanical":
                return ConvertAngle(call, f == "electrical" ? AngleKind.Electrical : AngleKind.Mechanical, a);
            case "abs": return a with { Value = Math.Abs(a.Value) };
            case "floor": return a with { Value = Math.Floor(a.Value) };
            case "ceil": return a with { Value = Math.Ceiling(a.Value) };
            case "round": return a with { Value = Math.Round(a.Value, MidpointRounding.AwayFromZero) };
            case "sqrt":
                if (a.Value < 0 || !a.Dimension.IsNone)
                {
                    diagnostics.Add(DiagnosticCatalog.InvalidArithmetic, call.Span, "sqrt() takes a plain non-negative number");
                    return null;
                }
                return Quantity.Plain(Math.Sqrt(a.Value));
        }
        var b = args[1];
        if (a.Dimension != b.Dimension)
        {
            diagnostics.Add(DiagnosticCatalog.InvalidArithmetic, call.Span, $"{f}() needs two quantities of the same kind");
            return null;
        }
        switch (f)
        {
            case "min": return a with { Value = Math.Min(a.Value, b.Value) };
            case "max": return a with { Value = Math.Max(a.Value, b.Value) };
        }
        if (!a.Dimension.IsNone || a.Value != Math.Floor(a.Value) || b.Value != Math.Floor(b.Value))
        {
            diagnostics.Add(DiagnosticCatalog.InvalidArithmetic, call.Span, $"{f}() takes whole numbers");
            return null;
        }
        // Beyond 2^53 not every whole number is exact, and the conversion to long could overflow.
        const double exact = 9_007_199_254_740_992;
        if (Math.Abs(a.Value) > exact || Math.Abs(b.Value) > exact)
        {
            diagnostics.Add(DiagnosticCatalog.NumberOutOfRange, call.Span, $"{f}() takes whole numbers up to 2^53 = 9007199254740992 in size");
            return null;
        }
        long x = Math.Abs((long)a.Value), y = Math.Abs((long)b.Value);
        long g = WindScript.Numerics.IntegerMath.Gcd(x, y);
        if (f == "gcd") return Quantity.Plain(g);
        double lcm = g == 0 ? 0 : (double)(x / g) * y;
        if (lcm > exact)
        {
            diagnostics.Add(DiagnosticCatalog.NumberOutOfRange, call.Span, "lcm() of these numbers is beyond 2^53 = 9007199254740992");
            return null;
        }
        return Quantity.Plain(lcm);
    }

    private Quantity? ConvertAngle(CallExpressionSyntax call, AngleKind written, Quantity a)
    {
        string f = call.Function.Text;
        if (a.Dimension != Dimension.AngleDim)
        {
            diagnostics.Add(DiagnosticCatalog.WrongDimension, call.Arguments[0].Span, $"{f}() takes an angle, but this is {a.Dimension.Describe()}");
            return null;
        }
        if (_angleContext is not { } expected)
        {
            diagnostics.Add(DiagnosticCatalog.AngleKindOutOfPlace, call.Span,
                $"{f}() states the kind of an angle where a property expects one (phase_shift and a sine's phase are electrical, skew is mechanical); write it in that property, not here");
            return null;
        }
        if (written == expected) return a;
        if (PolePairs <= 0)
        {
            diagnostics.Add(DiagnosticCatalog.AngleKindOutOfPlace, call.Span, $"{f}() converts through the pole pairs, but the machine's pole count is not known");
            return null;
        }
        // θ_electrical = p·θ_mechanical (Pyrhonen et al., ch. 2).
        return a with { Value = written == AngleKind.Electrical ? a.Value / PolePairs : a.Value * PolePairs };
    }

    // ---- typed evaluation with the diagnostics a designer needs ------------------------------

    /// <summary>Evaluates and requires a dimension; a bare number gets "expected a length unit such as mm after 150".</summary>
    public double? EvaluateAs(ExpressionSyntax expression, Scope scope, Dimension dimension, string what, params Dimension[] alternatives)
    {
        if (Evaluate(expression, scope) is not { } q) return null;
        if (q.Dimension == dimension || alternatives.Contains(q.Dimension)) return WithinMagnitude(expression, q.Value, what);
        if (q.Dimension.IsNone && IsBareNumber(expression))
        {
            string example = UnitTable.Example(dimension);
            diagnostics.Add(DiagnosticCatalog.MissingUnit.At(expression.Span,
                    $"expected {DescribeUnitKind(dimension)} unit such as {example} after {Literal(expression)}") with
                {
                    Fix = new CodeFix($"Add the unit '{example}'", [new TextEdit(new TextSpan(expression.Span.End, 0), " " + example)]),
                });
            return null;
        }
        diagnostics.Add(DiagnosticCatalog.WrongDimension, expression.Span,
            $"{what} must be {dimension.Describe()}, but this is {q.Dimension.Describe()}");
        return null;
    }

    /// <summary>The value if its size is within <see cref="InputLimits.MaxMagnitude"/> (SI); otherwise WS2042 and null.</summary>
    public double? WithinMagnitude(ExpressionSyntax expression, double value, string what)
    {
        if (Math.Abs(value) <= InputLimits.MaxMagnitude) return value;
        diagnostics.Add(DiagnosticCatalog.NumberOutOfRange, expression.Span, $"{what} is beyond the limit of {InputLimits.MaxMagnitude:0e0} in SI units ('windscript explain WS2042')");
        return null;
    }

    /// <summary>
    /// Evaluates and requires a plain whole number within bounds: <paramref name="min"/> and
    /// <paramref name="max"/> are what the quantity means (WS2012 outside), <paramref name="limit"/>
    /// what WindScript evaluates (<see cref="InputLimits"/>; WS2040 above it).
    /// </summary>
    public int? EvaluateInteger(ExpressionSyntax expression, Scope scope, string what, int min = int.MinValue, int max = int.MaxValue, int limit = int.MaxValue)
    {
        if (Evaluate(expression, scope) is not { } q) return null;
        if (!q.Dimension.IsNone)
        {
            diagnostics.Add(DiagnosticCatalog.WrongDimension, expression.Span, $"{what} is a plain number, but this is {q.Dimension.Describe()}");
            return null;
        }
        double rounded = Math.Round(q.Value);
        if (Math.Abs(q.Value - rounded) <= 1e-9 && rounded >= min && rounded > limit)
        {
            diagnostics.Add(DiagnosticCatalog.BeyondLimit, expression.Span, $"{what} {Format(q.Value)} is beyond the limit of {limit:N0} ('windscript explain WS2040')");
            return null;
        }
        // Nothing below int.MinValue or above int.MaxValue may reach the cast.
        if (limit == int.MaxValue && Math.Abs(q.Value - rounded) <= 1e-9 && (rounded < int.MinValue || rounded > int.MaxValue) && rounded >= min)
        {
            diagnostics.Add(DiagnosticCatalog.BeyondLimit, expression.Span, $"{what} {Format(q.Value)} is beyond the range of whole numbers WindScript evaluates (±2,147,483,647)");
            return null;
        }
        if (Math.Abs(q.Value - rounded) > 1e-9 || rounded < min || rounded > max)
        {
            // The range names the bound that applies: the lower of what the quantity means and what is evaluated.
            int upper = Math.Min(max, limit);
            string range = min == int.MinValue ? "" : upper == int.MaxValue ? $" of at least {min}" : $" from {min} to {upper:N0}";
            diagnostics.Add(DiagnosticCatalog.InvalidCount, expression.Span, $"{what} must be a whole number{range}, not {FormatExact(q.Value)}");
            return null;
        }
        return (int)rounded;
    }

    private static bool IsBareNumber(ExpressionSyntax e) => e switch
    {
        NumberSyntax n => n.Unit is null,
        UnaryExpressionSyntax u => IsBareNumber(u.Operand),
        _ => false,
    };

    private static string Literal(ExpressionSyntax e) => e switch
    {
        NumberSyntax n => n.Literal,
        UnaryExpressionSyntax u => "-" + Literal(u.Operand),
        _ => "the value",
    };

    private static string DescribeUnitKind(Dimension d)
    {
        if (d == Dimension.SlotDim) return "a";
        string kind = d.Describe();
        return kind.StartsWith("a ", StringComparison.Ordinal) || kind.StartsWith("an ", StringComparison.Ordinal) ? kind : "a";
    }

    public static string Format(double v) => v.ToString("G10", CultureInfo.InvariantCulture);

    /// <summary>A value as written, to the last digit when it is not whole (2147483648.5 must not read as 2147483648).</summary>
    public static string FormatExact(double v) =>
        Math.Abs(v - Math.Round(v)) > 1e-9 && Format(v) is var shown && double.Parse(shown, CultureInfo.InvariantCulture) == Math.Round(v)
            ? v.ToString("R", CultureInfo.InvariantCulture)
            : Format(v);
}
