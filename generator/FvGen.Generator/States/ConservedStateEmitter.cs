using System.Collections.Generic;
using FvGen.Generator.Common;

namespace FvGen.Generator.States;

/// <summary>Writes the arithmetic, <c>Zero</c>, component table and span helpers of a conserved state.</summary>
internal static class ConservedStateEmitter
{
    public static string HintName(ConservedStateModel model) => model.Location.HintName + ".ConservedState.g.cs";

    public static string Emit(ConservedStateModel model)
    {
        string s = model.FullyQualifiedName;
        int n = model.Components.Count;
        return GeneratedFile.Write(model.Location, "conserved-state members (" + n + " components)", w =>
        {
            w.Line("/// <summary>Number of <see cref=\"double\"/> components, nested groups flattened.</summary>");
            w.Line("public const int ComponentCount = " + SourceLiteral.Int(n) + ";");
            w.Line();
            w.Line("/// <summary>Component names in memory order; nested groups read <c>Outer.Inner</c>.</summary>");
            var names = new List<string>();
            foreach (var c in model.Components)
            {
                names.Add(SourceLiteral.String(c.Name));
            }

            w.Line("public static global::System.Collections.Generic.IReadOnlyList<string> ComponentNames { get; } = new string[] { " + string.Join(", ", names) + " };");
            w.Line();
            w.Line("/// <summary>The state with every component zero.</summary>");
            w.Line("public static " + s + " Zero => default;");
            w.Line();
            Binary(w, model, "+", "The component-wise sum.");
            Binary(w, model, "-", "The component-wise difference.");
            w.Line("/// <summary>The component-wise negation.</summary>");
            w.Open("public static " + s + " operator -(in " + s + " a)");
            w.Line(s + " r;");
            foreach (var c in model.Components)
            {
                w.Line("r." + c.Access + " = -a." + c.Access + ";");
            }

            w.Line("return r;");
            w.Close();
            w.Line();
            Scale(w, model, "public static " + s + " operator *(double s, in " + s + " a)", "s * a.", "", "Every component scaled by <paramref name=\"s\"/>.");
            Scale(w, model, "public static " + s + " operator *(in " + s + " a, double s)", "a.", " * s", "Every component scaled by <paramref name=\"s\"/>.");
            Scale(w, model, "public static " + s + " operator /(in " + s + " a, double s)", "a.", " / s", "Every component divided by <paramref name=\"s\"/>.");
            w.Line("/// <summary>The components of a span of states as one flat span of doubles, state by state.</summary>");
            w.Line("public static global::System.Span<double> AsComponents(global::System.Span<" + s + "> states) =>");
            w.Line("    global::System.Runtime.InteropServices.MemoryMarshal.Cast<" + s + ", double>(states);");
            w.Line();
            w.Line("/// <summary>The components of a read-only span of states as one flat span of doubles, state by state.</summary>");
            w.Line("public static global::System.ReadOnlySpan<double> AsComponents(global::System.ReadOnlySpan<" + s + "> states) =>");
            w.Line("    global::System.Runtime.InteropServices.MemoryMarshal.Cast<" + s + ", double>(states);");
            w.Line();
            w.Line("/// <summary>The components of one state, in place.</summary>");
            w.Line("public static global::System.Span<double> Components(ref " + s + " state) =>");
            w.Line("    global::System.Runtime.InteropServices.MemoryMarshal.CreateSpan(ref global::System.Runtime.CompilerServices.Unsafe.As<" + s + ", double>(ref state), ComponentCount);");
            w.Line();
            w.Line("/// <summary>Adds every component of <paramref name=\"state\"/> to <paramref name=\"totals\"/>, which holds <see cref=\"ComponentCount\"/> values.</summary>");
            w.Open("public static void AddTo(global::System.Span<double> totals, in " + s + " state)");
            w.Line("if (totals.Length < ComponentCount)");
            w.Open();
            w.Line("throw new global::System.ArgumentException(\"The totals span holds \" + totals.Length + \" values; \" + ComponentCount + \" are needed.\", nameof(totals));");
            w.Close();
            w.Line();
            for (int i = 0; i < n; i++)
            {
                w.Line("totals[" + SourceLiteral.Int(i) + "] += state." + model.Components[i].Access + ";");
            }

            w.Close();
        });
    }

    private static void Binary(IndentedWriter w, ConservedStateModel model, string op, string summary)
    {
        string s = model.FullyQualifiedName;
        w.Line("/// <summary>" + summary + "</summary>");
        w.Open("public static " + s + " operator " + op + "(in " + s + " a, in " + s + " b)");
        w.Line(s + " r;");
        foreach (var c in model.Components)
        {
            w.Line("r." + c.Access + " = a." + c.Access + " " + op + " b." + c.Access + ";");
        }

        w.Line("return r;");
        w.Close();
        w.Line();
    }

    private static void Scale(IndentedWriter w, ConservedStateModel model, string header, string before, string after, string summary)
    {
        w.Line("/// <summary>" + summary + "</summary>");
        w.Open(header);
        w.Line(model.FullyQualifiedName + " r;");
        foreach (var c in model.Components)
        {
            w.Line("r." + c.Access + " = " + before + c.Access + after + ";");
        }

        w.Line("return r;");
        w.Close();
        w.Line();
    }
}
