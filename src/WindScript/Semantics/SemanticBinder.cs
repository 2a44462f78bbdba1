using System.Collections.Immutable;
using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;
using WindScript.Text;

namespace WindScript.Semantics;

/// <summary>
/// The semantic pass, a binder: resolves names, checks units and evaluates expressions, loops
/// and patterns into an immutable <see cref="WindingDesign"/>, one block binder per block
/// kind. It runs on whatever parsed, so a file with syntax errors still gets every other check.
/// </summary>
internal static class SemanticBinder
{
    public sealed record Result(WindingDesign? Design, SemanticModel Model, IReadOnlyList<Diagnostic> Diagnostics);

    public static Result Bind(SyntaxTree tree)
    {
        var diagnostics = new DiagnosticBag();
        var model = new SemanticModel();
        var evaluator = new ExpressionEvaluator(diagnostics);
        var budget = new ExpansionBudget(diagnostics);
        var defaults = new List<string>();
        var top = new Scope(null);

        BlockSyntax? machineBlock = null, windingBlock = null, slotBlock = null, conductorBlock = null;
        var driveBlocks = new List<BlockSyntax>();
        foreach (var statement in Flatten(tree.Root.Statements))
        {
            switch (statement)
            {
                case LetSyntax let:
                    LetBinder.Bind(let, top, evaluator, diagnostics, model);
                    break;
                case BlockSyntax { Kind: BlockKind.Machine } b:
                    if (machineBlock is null) machineBlock = b;
                    else diagnostics.Add(DiagnosticCatalog.MoreThanOne, b.Keyword.Span, "a file describes one machine; this is a second machine block");
                    break;
                case BlockSyntax { Kind: BlockKind.Winding } b:
                    if (windingBlock is null) windingBlock = b;
                    else diagnostics.Add(DiagnosticCatalog.MoreThanOne, b.Keyword.Span, "a file describes one winding; this is a second winding block");
                    break;
                case BlockSyntax { Kind: BlockKind.Drive } b:
                    driveBlocks.Add(b);
                    break;
                case BlockSyntax { Kind: BlockKind.Slot or BlockKind.Conductor } b:
                    ref var one = ref (b.Kind == BlockKind.Slot ? ref slotBlock : ref conductorBlock);
                    if (one is null) one = b;
                    else diagnostics.Add(DiagnosticCatalog.MoreThanOne, b.Keyword.Span, $"a file describes one {b.Keyword.Text}; this is a second {b.Keyword.Text} block");
                    break;
                default:
                    BlockRules.ReportMisplaced(diagnostics, statement, "the top level of a file (put it in a machine, winding or drive block)");
                    break;
            }
        }

        var machine = new MachineFacts();
        if (machineBlock is null)
            diagnostics.Add(DiagnosticCatalog.MissingDeclaration, new TextSpan(0, 0), "this file has no machine block (slots, poles, phases)");
        else
        {
            machine = new MachineBinder(diagnostics, evaluator, model).Bind(machineBlock, top);
            if (!machineBlock.Name.IsMissing) model.Define(machine.Name, SymbolKind.Machine, machineBlock.Name.Span);
            // A property whose line did not parse was reported already; do not call it missing.
            var brokenLines = machineBlock.Body.OfType<ErrorStatementSyntax>().Select(e => e.Tokens[0].Text).ToHashSet();
            void Require(bool present, string keyword, string what)
            {
                if (!present && !brokenLines.Contains(keyword)) diagnostics.Add(DiagnosticCatalog.MissingDeclaration, machineBlock.Keyword.Span, $"machine '{machine.Name}' does not give {what}");
            }
            string slotsWord = Vocabulary.Word(PropertyName.Slots), polesWord = Vocabulary.Word(PropertyName.Poles);
            Require(machine.Slots is not null || machine.SlotsSpan != default, slotsWord, $"its slot count ('{slotsWord}')");
            Require(machine.Poles is not null || machine.PolesSpan != default, polesWord, $"its pole count ('{polesWord}')");
            Require(!machine.Phases.IsDefaultOrEmpty || machine.PhasesSpan != default, Vocabulary.PhasesWord, $"its phases ('{Vocabulary.PhasesWord} U V W')");
        }
        evaluator.Slots = machine.Slots ?? 0;

        int m = machine.Phases.IsDefault ? 0 : machine.Phases.Length;
        double shift = machine.PhaseShiftDegrees ?? PhaseShift.DefaultDegrees(m);
        if (machine.PhaseShiftDegrees is null && m >= 2)
            defaults.Add($"phase shift {shift:0.###} deg electrical between successive phases ({(m == 2 ? "90 deg for two phases" : "360/m")})");

        var phases = new PhaseTable(machine.Phases.IsDefault ? [] : machine.Phases, model, diagnostics);
        Winding? winding = null;
        if (windingBlock is null)
            diagnostics.Add(DiagnosticCatalog.MissingDeclaration, machineBlock?.Keyword.Span ?? new TextSpan(0, 0), "this file has no winding block");
        else
        {
            winding = new WindingBinder(diagnostics, evaluator, model, machine, phases, budget, defaults).Bind(windingBlock, top);
            if (!windingBlock.Name.IsMissing) model.Define(windingBlock.Name.Text, SymbolKind.Winding, windingBlock.Name.Span);
        }

        // Conductors and slots (#15): optional blocks; a file without them evaluates as before.
        var slot = slotBlock is null ? null : new SlotBinder(diagnostics, evaluator, model).Bind(slotBlock, top);
        var conductor = conductorBlock is null ? null : new ConductorBinder(diagnostics, evaluator, model).Bind(conductorBlock, top);

        var drives = ImmutableArray.CreateBuilder<Drive>();
        var driveNames = new Dictionary<string, TextSpan>();
        foreach (var block in driveBlocks)
        {
            if (!block.Name.IsMissing)
            {
                var name = block.Name;
                if (driveNames.TryGetValue(name.Text, out var first))
                    diagnostics.Add(DiagnosticCatalog.DuplicateName.At(name.Span, $"drive '{name.Text}' is already defined")
                        with { Related = [new RelatedSpan(first, "first defined here")] });
                else driveNames[name.Text] = name.Span;
                model.Define(name.Text, SymbolKind.Drive, name.Span);
            }
            drives.Add(new DriveBinder(diagnostics, evaluator, model, phases, shift, machine.Poles / 2).Bind(block, top));
        }

        HashSet<string>? mentioned = null;
        foreach (var symbol in model.Symbols)
            if (symbol.Kind == SymbolKind.Value && !symbol.Used && !(mentioned ??= NameMentions.Of(tree)).Contains(symbol.Name))
                diagnostics.Add(DiagnosticCatalog.UnusedName, symbol.Definition, $"'{symbol.Name}' is defined but never used");

        WindingDesign? design = null;
        if (machine.Slots is { } q && machine.Poles is { } poles && m > 0 && winding is not null)
        {
            design = new WindingDesign
            {
                Name = machine.Name,
                Slots = q,
                Poles = poles,
                Phases = machine.Phases,
                PhaseShiftDegrees = shift,
                Geometry = machine.Geometry,
                Winding = winding,
                Slot = slot,
                Conductor = conductor,
                Drives = drives.ToImmutable(),
                Defaults = [.. defaults.Distinct()],
                MachineSpan = machine.Span,
                MachineKeywordSpan = machine.KeywordSpan,
                SlotsSpan = machine.SlotsSpan,
                PolesSpan = machine.PolesSpan,
                PhasesSpan = machine.PhasesSpan,
            };
        }
        return new Result(design, model, diagnostics.Items);
    }

    // A block left unclosed swallows the blocks after it; read those as top-level blocks again
    // so that a missing '}' is one diagnostic, not one per following block.
    private static IEnumerable<StatementSyntax> Flatten(IReadOnlyList<StatementSyntax> statements)
    {
        foreach (var statement in statements)
        {
            if (statement is BlockSyntax { Closed: false } block)
            {
                bool IsTopLevel(StatementSyntax s) => s is BlockSyntax b && Vocabulary.Block(b.Kind).TopLevel;
                yield return block with { Body = block.Body.Where(s => !IsTopLevel(s)).ToArray() };
                foreach (var inner in Flatten(block.Body.Where(IsTopLevel).ToArray())) yield return inner;
            }
            else
            {
                yield return statement;
            }
        }
    }
}
