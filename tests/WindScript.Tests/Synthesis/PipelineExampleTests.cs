using WindScript.Examples.Pipeline;
using WindScript.Analysis;
using WindScript.Formatting;

namespace WindScript.Tests.Synthesis;

/// <summary>Runs the library pipeline under examples/pipeline and checks what it writes.</summary>
public class PipelineExampleTests
{
    [Fact]
    public void The_pipeline_writes_canonical_files_that_compile_clean_and_meet_its_filter()
    {
        var folder = Path.Combine(Path.GetTempPath(), $"windscript-pipeline-{Guid.NewGuid():N}");
        try
        {
            var log = new StringWriter();
            int exit = PipelineProgram.Main([folder, "--slots", "9..36", "--poles", "6..16", "--best", "4"]);
            Assert.Equal(0, exit);
            var paths = PipelineProgram.Run(folder, 9, 36, 6, 16, 4, log);
            Assert.Equal(4, paths.Count);
            Assert.Equal(paths.OrderBy(p => p), Directory.GetFiles(folder, "*.wind").OrderBy(p => p));
            double previous = 0;
            foreach (var path in paths)
            {
                var text = File.ReadAllText(path);
                Assert.Equal(text, Formatter.Format(text));
                var compilation = Compilation.Compile(text, path);
                Assert.False(compilation.HasErrors, string.Join("\n", compilation.Diagnostics));
                var analysis = MachineAnalysis.Evaluate(compilation.Design!);
                double kw = PipelineProgram.Fundamental(analysis), leakage = analysis.DifferentialLeakage!.Value;
                Assert.True(kw >= 0.9, $"{path}: k_w1 = {kw}");
                Assert.True(leakage >= previous - 1e-9, $"{path}: ranked by leakage");
                Assert.Empty(analysis.Balanced.SubHarmonics);
                previous = leakage;
            }
        }
        finally
        {
            if (Directory.Exists(folder)) Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public void A_winding_built_in_code_equals_the_synthesised_one_up_to_rotation()
    {
        // 12 slots, 10 poles: the hand-made tooth-coil layout and the star of slots agree on every figure.
        var handMade = MachineAnalysis.Evaluate(PipelineProgram.FromTopPattern("hub", 12, 10, "U -U -V V W -W -U U V -V -W W", 20));
        var synthesised = MachineAnalysis.Evaluate(Synth.Design(12, 10, turns: 20));
        Assert.Equal(PipelineProgram.Fundamental(synthesised), PipelineProgram.Fundamental(handMade), 12);
        Assert.Equal(synthesised.DifferentialLeakage!.Value, handMade.DifferentialLeakage!.Value, 9);
    }
}
