namespace WindScript.Sweep;

/// <summary>
/// The sweep for library users: every balanced layout of a spec (or of one shard of it), in the
/// sweep's fixed order, one fresh record each. For speed on many cores, run one
/// <see cref="SweepEvaluator"/> per thread over <see cref="SweepPlan"/> instead, as the CLI does.
/// </summary>
public static class LayoutSweep
{
    /// <summary>Every feasible layout of the spec (or of one shard of it) in the fixed sweep order, evaluated.</summary>
    public static IEnumerable<SweepRecord> Records(SweepSpec spec, SweepShard? shard = null)
    {
        var evaluator = new SweepEvaluator(spec);
        foreach (var candidate in SweepPlan.Shard(spec, shard ?? SweepShard.Whole))
        {
            var record = new SweepRecord();
            if (evaluator.TryEvaluate(candidate, record)) yield return record;
        }
    }
}
