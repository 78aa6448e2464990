using SkiaSharp;

namespace FvGen.Samples.Demo;

/// <summary>Draws the dye and salt profiles at the start and the end as one PNG.</summary>
internal static class ProfilePlot
{
    /// <summary>
    /// A description of the font text is drawn with, or <see langword="null"/> when none is usable:
    /// without one, ScottPlot draws no text at all and says nothing.
    /// </summary>
    public static string? UsableFont()
    {
        string name = ScottPlot.Fonts.Default;
        if (string.IsNullOrWhiteSpace(name))
        {
            return null;
        }

        return SKFontManager.Default.GetFontFamilies().Contains(name, StringComparer.OrdinalIgnoreCase) ? name : null;
    }

    public static void Write(string path, double[] x, ChannelWater[] start, ChannelWater[] end, double endTime)
    {
        var plot = new ScottPlot.Plot();
        AddLine(plot, x, start.Select(w => w.Dye).ToArray(), "dye, t = 0", ScottPlot.Colors.SteelBlue, dashed: true);
        AddLine(plot, x, end.Select(w => w.Dye).ToArray(), $"dye, t = {endTime:0} s", ScottPlot.Colors.SteelBlue, dashed: false);
        plot.Title("Dye pulse and salt front along the channel");
        plot.XLabel("distance from the head gate (m)");
        plot.YLabel("dye (g/m³)");

        // Salt is two orders of magnitude larger: give it the right-hand axis.
        var saltStart = AddLine(plot, x, start.Select(w => w.Salt).ToArray(), "salt, t = 0", ScottPlot.Colors.DarkOrange, dashed: true);
        var saltEnd = AddLine(plot, x, end.Select(w => w.Salt).ToArray(), $"salt, t = {endTime:0} s", ScottPlot.Colors.DarkOrange, dashed: false);
        saltStart.Axes.YAxis = plot.Axes.Right;
        saltEnd.Axes.YAxis = plot.Axes.Right;
        plot.Axes.Right.Label.Text = "salt (g/m³)";
        plot.ShowLegend(ScottPlot.Alignment.UpperRight);

        // Fixed ranges from zero keep the initial salt level apart from the zero line of the dye.
        plot.Axes.SetLimitsY(0, 1.1 * ChannelScenario.PulsePeak, plot.Axes.Left);
        plot.Axes.SetLimitsY(0, 1.1 * Math.Max(ChannelScenario.InflowSalt, ChannelScenario.InitialSalt), plot.Axes.Right);

        byte[] png = plot.GetImageBytes(1000, 520, ScottPlot.ImageFormat.Png);
        FvGen.Output.AtomicFile.WriteBytes(path, png);
    }

    private static ScottPlot.Plottables.Scatter AddLine(ScottPlot.Plot plot, double[] x, double[] y, string label, ScottPlot.Color colour, bool dashed)
    {
        var line = plot.Add.Scatter(x, y);
        line.LegendText = label;
        line.Color = colour;
        line.MarkerSize = 0;
        line.LineWidth = 2;
        if (dashed)
        {
            line.LinePattern = ScottPlot.LinePattern.Dashed;
        }

        return line;
    }
}
