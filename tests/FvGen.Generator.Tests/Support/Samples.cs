namespace FvGen.Generator.Tests.Support;

/// <summary>Small user sources of the kind a CFD engineer writes, shared by the generator-driver tests.</summary>
internal static class Samples
{
    public const string State = """
        using FvGen;

        namespace Demo;

        public struct Pair
        {
            public double X;
            public double Y;
        }

        [ConservedState]
        public partial struct Flow
        {
            public double Density;
            public Pair Momentum;
        }
        """;

    public const string Scalar = """
        using FvGen;

        namespace Demo;

        [ConservedState]
        public partial struct Heat
        {
            public double Energy;
        }
        """;

    public const string Conduction1D = """
        using System;
        using FvGen;
        using FvGen.Boundaries;
        using FvGen.Geometry;
        using FvGen.Ledger;
        using FvGen.Meshes.Structured;

        namespace Demo;

        public static partial class Conduction
        {
            public const double Conductivity = 0.5;

            [NumericalFlux(Antisymmetric = true)]
            public static Heat TwoPoint(in Heat left, in Heat right, in FaceGeometry face) =>
                new() { Energy = -Conductivity * (right.Energy - left.Energy) / face.CentreDistance };

            [BoundaryFlux(BoundaryKind.Wall)]
            public static Heat Insulated(in Heat inside, in FaceGeometry face) => default;

            [ResidualKernel(nameof(TwoPoint))]
            public static partial void Residual(StructuredGrid1D grid, ReadOnlySpan<Heat> temperature, Span<Heat> rate, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);
        }
        """;

    public const string ConductionUnstructured = """
        using System;
        using System.Threading.Tasks;
        using FvGen;
        using FvGen.Boundaries;
        using FvGen.Geometry;
        using FvGen.Meshes.Unstructured;

        namespace Demo;

        public static partial class Spreading
        {
            [NumericalFlux]
            public static Heat TwoPoint(in Heat left, in Heat right, in FaceGeometry face) =>
                new() { Energy = -(right.Energy - left.Energy) / face.CentreDistance };

            [BoundaryFlux(BoundaryKind.Wall)]
            public static Heat Insulated(in Heat inside, in FaceGeometry face) => default;

            [ResidualKernel(nameof(TwoPoint), Mode = ExecutionMode.ParallelGather)]
            internal static partial void Residual(UnstructuredMesh mesh, ReadOnlyMemory<Heat> state, Memory<Heat> rate, [FaceData] Memory<Heat> faceFlux, BoundaryBinding<Boundary> boundaries, ParallelOptions options);
        }
        """;

    public const string Muscl1D = """
        using System;
        using FvGen;
        using FvGen.Geometry;
        using FvGen.Meshes.Structured;

        namespace Demo;

        public static partial class Ring
        {
            [NumericalFlux]
            public static Heat Upwind(in Heat left, in Heat right, in FaceGeometry face) =>
                new() { Energy = face.Normal.X >= 0 ? face.Normal.X * left.Energy : face.Normal.X * right.Energy };

            [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.VanLeer)]
            public static partial void Residual(StructuredGrid1D grid, ReadOnlySpan<Heat> state, Span<Heat> rate);
        }
        """;

    public const string PatchedMuscl1D = """
        using System;
        using FvGen;
        using FvGen.Boundaries;
        using FvGen.Geometry;
        using FvGen.Ledger;
        using FvGen.Meshes.Structured;

        namespace Demo;

        public static partial class Channel
        {
            [NumericalFlux]
            public static Heat Upwind(in Heat left, in Heat right, in FaceGeometry face) =>
                new() { Energy = face.Normal.X >= 0 ? face.Normal.X * left.Energy : face.Normal.X * right.Energy };

            [BoundaryFlux(BoundaryKind.Outflow)]
            public static Heat Away(in Heat inside, in FaceGeometry face) => new() { Energy = face.Normal.X * inside.Energy };

            public static void Slopes(
                in Heat leftLeft, in Heat left, in Heat right, in Heat rightRight,
                double widthLeftLeft, double widthLeft, double widthRight, double widthRightRight, out Heat leftFace, out Heat rightFace)
            {
                leftFace = new() { Energy = left.Energy + 0.5 * widthLeft * (right.Energy - leftLeft.Energy) / (0.5 * widthLeftLeft + widthLeft + 0.5 * widthRight) };
                rightFace = new() { Energy = right.Energy - 0.5 * widthRight * (rightRight.Energy - left.Energy) / (0.5 * widthLeft + widthRight + 0.5 * widthRightRight) };
            }

            [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.Minmod)]
            public static partial void Limited(StructuredGrid1D grid, ReadOnlySpan<Heat> state, Span<Heat> rate, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

            [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(Slopes))]
            public static partial void Central(StructuredGrid1D grid, ReadOnlySpan<Heat> state, Span<Heat> rate, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);
        }
        """;

    public const string Gather2D = """
        using System;
        using System.Threading.Tasks;
        using FvGen;
        using FvGen.Boundaries;
        using FvGen.Geometry;
        using FvGen.Ledger;
        using FvGen.Meshes.Structured;

        namespace Demo;

        public static partial class Mixing
        {
            [NumericalFlux(Antisymmetric = true)]
            public static Heat TwoPoint(in Heat left, in Heat right, in FaceGeometry face) =>
                new() { Energy = -(right.Energy - left.Energy) / face.CentreDistance };

            [BoundaryFlux(BoundaryKind.Wall)]
            public static Heat Insulated(in Heat inside, in FaceGeometry face) => default;

            [ResidualKernel(nameof(TwoPoint), Mode = ExecutionMode.ParallelGather)]
            public static partial void Residual(
                StructuredGrid2D grid, ReadOnlyMemory<Heat> state, Memory<Heat> rate, [FaceData] Memory<Heat> faceFlux, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally, ParallelOptions options);
        }
        """;

    public const string UserUnstructured = """
        using System;
        using FvGen;
        using FvGen.Boundaries;
        using FvGen.Geometry;
        using FvGen.Meshes.Unstructured;

        namespace Demo;

        public static partial class Plume
        {
            [NumericalFlux]
            public static Heat Upwind(in Heat left, in Heat right, in FaceGeometry face) =>
                new() { Energy = face.Normal.X >= 0 ? face.Normal.X * left.Energy : face.Normal.X * right.Energy };

            [BoundaryFlux(BoundaryKind.Outflow)]
            public static Heat Open(in Heat inside, in FaceGeometry face) => new() { Energy = face.Normal.X * inside.Energy };

            public static void HalfSlope(in Heat cell, in Gradient<Heat> gradient, in Vec3 toFace, out Heat faceState) =>
                faceState = cell + 0.5 * (toFace.X * gradient.X + toFace.Y * gradient.Y + toFace.Z * gradient.Z);

            [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(HalfSlope))]
            public static partial void Residual(UnstructuredMesh mesh, ReadOnlySpan<Heat> state, Span<Heat> rate, Span<Gradient<Heat>> gradients, BoundaryBinding<Boundary> boundaries);
        }
        """;

    /// <summary>A second, independent kernel in a file of its own (for caching tests).</summary>
    public const string Other = """
        using System;
        using FvGen;
        using FvGen.Geometry;
        using FvGen.Meshes.Structured;

        namespace Demo;

        public static partial class Drift
        {
            [NumericalFlux]
            public static Heat Upwind(in Heat left, in Heat right, in FaceGeometry face) =>
                new() { Energy = face.Normal.X * left.Energy };

            [ResidualKernel(nameof(Upwind))]
            public static partial void Residual(StructuredGrid2D grid, ReadOnlySpan<Heat> state, Span<Heat> rate);
        }
        """;
}
