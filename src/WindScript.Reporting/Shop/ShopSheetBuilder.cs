using WindScript.Model;

namespace WindScript.Reporting.Shop;

/// <summary>
/// Builds the <see cref="ShopSheet"/> of a design: the one adapter between the winding model
/// (coils, and the connection) and the shop's documents. Coils are numbered in slot order of
/// their start side, as a winder counts them.
/// </summary>
public static class ShopSheetBuilder
{
    /// <summary>Strands in hand when the file states no conductor.</summary>
    public const int DefaultStrands = 1;

    public static ShopSheet Build(WindingDesign d, string source)
    {
        var coils = d.Winding.Coils;
        int q = d.Slots;
        var order = Enumerable.Range(0, coils.Length)
            .OrderBy(i => coils[i].GoSlot).ThenBy(i => coils[i].GoLayer).ThenBy(i => coils[i].Phase).ThenBy(i => i).ToList();
        var numberOf = new int[coils.Length];
        for (int n = 0; n < order.Count; n++) numberOf[order[n]] = n + 1;

        var connection = ProvisionalConnection.Derive(d, order);
        int strands = d.Conductor?.Strands ?? DefaultStrands;

        var groupOfCoil = new int[coils.Length];
        var pathOfGroup = new int[connection.Groups.Count];
        for (int p = 0; p < connection.PathsOfPhase.Count; p++)
        {
            var groupsInPath = connection.PathsOfPhase[p];
            int number = connection.PathsOfPhase.Take(p).Count(other => connection.Groups[other[0]].Phase == connection.Groups[groupsInPath[0]].Phase) + 1;
            foreach (int g in groupsInPath) pathOfGroup[g] = number;
        }
        var groups = new List<ShopGroup>();
        var perPhase = new int[d.Phases.Length];
        for (int g = 0; g < connection.Groups.Count; g++)
        {
            var group = connection.Groups[g];
            foreach (int i in group.Coils) groupOfCoil[i] = g + 1;
            groups.Add(new ShopGroup
            {
                Number = g + 1,
                Phase = group.Phase,
                IndexInPhase = ++perPhase[group.Phase],
                Coils = [.. group.Coils.Select(i => numberOf[i])],
                Polarity = group.Polarity,
                StartSlot = coils[group.Coils[0]].GoSlot,
                FinishSlot = coils[group.Coils[^1]].ReturnSlot,
                Path = pathOfGroup[g],
            });
        }

        var shopCoils = order.Select(i => new ShopCoil
        {
            Number = numberOf[i],
            Phase = coils[i].Phase,
            StartSlot = coils[i].GoSlot,
            StartLayer = coils[i].GoLayer,
            FinishSlot = coils[i].ReturnSlot,
            FinishLayer = coils[i].ReturnLayer,
            Turns = coils[i].Turns,
            Strands = strands,
            Group = groupOfCoil[i],
            Span = ShortSpan(coils[i], q),
        }).ToList();

        var paths = new List<ShopPath>();
        var jumpers = new List<ShopJumper>();
        var leads = new List<ShopLead>();
        foreach (var groupsInPath in connection.PathsOfPhase)
        {
            var members = groupsInPath.Select(g => groups[g]).ToList();
            var path = new ShopPath(members[0].Phase, members[0].Path, [.. members.Select(m => m.Number)]);
            paths.Add(path);
            for (int k = 0; k + 1 < members.Count; k++)
            {
                var (from, to) = (members[k], members[k + 1]);
                jumpers.Add(new ShopJumper(jumpers.Count + 1, path.Phase, path.Number, from.Number, from.Exit, from.SlotAt(from.Exit), to.Number, to.Entry, to.SlotAt(to.Entry)));
            }
        }
        // Leads in terminal order: every phase's start (mark 1), then every phase's finish (mark 2).
        foreach (var (suffix, first) in new[] { ("1", true), ("2", false) })
            foreach (var path in paths.OrderBy(p => p.Phase).ThenBy(p => p.Number))
            {
                var g = groups[(first ? path.Groups[0] : path.Groups[^1]) - 1];
                var end = first ? g.Entry : g.Exit;
                leads.Add(new ShopLead(leads.Count + 1, d.Phases[path.Phase].Name + suffix, path.Phase, path.Number, g.Number, end, g.SlotAt(end)));
            }

        var joints = new List<ShopJoint>();
        if (connection.Star)
            joints.Add(new ShopJoint("N", JointKind.Star, [.. d.Phases.Select(p => p.Name + "2")], BroughtOut: false));

        var notes = new List<string>
        {
            d.Conductor is null
                ? $"Strands in hand: the file states no conductor, so every coil is shown with {DefaultStrands} strand."
                : $"Strands in hand and wire from the file's conductor block '{d.Conductor.Name}'.",
            "Connection: the file states none; groups, paths and leads are provisional (consecutive coils of one phase and polarity form a group; paths split the groups in slot order; the phase finishes are starred).",
        };

        return new ShopSheet
        {
            Machine = d.Name,
            Winding = d.Winding.Name,
            Source = source,
            Slots = q,
            Poles = d.Poles,
            Layers = d.Winding.Layers,
            Wire = Wire(d.Conductor),
            Phases = [.. d.Phases.Select(p => p.Name)],
            Coils = shopCoils,
            Groups = groups,
            Paths = paths,
            Jumpers = jumpers,
            Leads = leads,
            Joints = joints,
            Rotation = new ShopRotation(connection.SlotDirection, null, d.Phases.Length >= 3 ? "L1 L2 L3 on " + string.Join(" ", d.Phases.Take(3).Select(p => p.Name + "1")) : "balanced supply in phase order"),
            Notes = notes,
        };
    }

    /// <summary>The conductor in the shop's words ("round wire 0.9 mm bare, grade 2, copper, 2 in hand"), or null when the file states none.</summary>
    private static string? Wire(ConductorSpec? c)
    {
        if (c is null) return null;
        static string Mm(double metres) => (metres * 1000).ToString("0.###", System.Globalization.CultureInfo.InvariantCulture) + " mm";
        string shape = c.IsStrip
            ? $"strip {(c.StripWidth is { } w ? Mm(w) : "?")} × {(c.StripHeight is { } h ? Mm(h) : "?")}"
            : c.BareDiameter is { } bare ? $"round wire {Mm(bare)} bare" + (c.Grade is { } g ? $", grade {g}" : "")
            : c.OverallDiameter is { } overall ? $"round wire {Mm(overall)} overall" : "wire of unstated size";
        return $"{shape}, {(c.Material == ConductorMaterial.Copper ? "copper" : "aluminium")}, {c.Strands} in hand";
    }

    /// <summary>The span from go to return the short way round: +k towards higher slot numbers, -k towards lower.</summary>
    private static int ShortSpan(Coil coil, int slots)
    {
        int forward = coil.PitchSlots(slots);
        return forward > slots / 2 ? forward - slots : forward;
    }
}
