using FvGen.Boundaries;
using FvGen.Generator.Tests.Kernels;
using FvGen.Meshes.Structured;

namespace FvGen.Generator.Tests.Boundaries;

/// <summary>The run-time binding of patch names to the boundary fluxes of a kernel's type.</summary>
public sealed class BoundaryBindingTests
{
    private static readonly StructuredGrid2D Channel = new(
        GridAxis.Uniform(4, 0, 4),
        GridAxis.Uniform(2, 0, 1),
        SideBoundary.Patch("inlet"),
        SideBoundary.Patch("outlet"),
        SideBoundary.Patch("walls"),
        SideBoundary.Patch("walls"));

    [Fact]
    public void ResolvesOneFluxPerPatchInPatchIndexOrder()
    {
        var binding = new BoundaryBinding<ShallowWater.Boundary>()
            .Bind("walls", ShallowWater.Boundary.Wall)
            .Bind("outlet", ShallowWater.Boundary.Outflow)
            .Bind("inlet", ShallowWater.Boundary.Outflow);
        var fluxes = binding.Resolve(Channel).ToArray();
        Assert.Equal(["inlet", "outlet", "walls"], Channel.PatchNames);
        Assert.Equal([ShallowWater.Boundary.Outflow, ShallowWater.Boundary.Outflow, ShallowWater.Boundary.Wall], fluxes);
        Assert.Equal(BoundaryKind.Wall, ShallowWater.KindOf(ShallowWater.Boundary.Wall));
        Assert.Equal(BoundaryKind.Outflow, ShallowWater.KindOf(ShallowWater.Boundary.Outflow));
    }

    [Fact]
    public void UnboundAndUnknownPatchesAreNamedInOneError()
    {
        var binding = new BoundaryBinding<ShallowWater.Boundary>()
            .Bind("inlet", ShallowWater.Boundary.Outflow)
            .Bind("outflow", ShallowWater.Boundary.Outflow);
        var error = Assert.Throws<BoundaryBindingException>(() => binding.Validate(Channel));
        Assert.Equal(["outlet", "walls"], error.UnboundPatches);
        Assert.Equal(["outflow"], error.UnknownPatches);
        Assert.Contains("'outlet', 'walls'", error.Message);
        Assert.Contains("'outflow' are not patches of the mesh", error.Message);
        Assert.Contains("The mesh's patches are: 'inlet', 'outlet', 'walls'", error.Message);
    }

    [Fact]
    public void BindingAPatchTwiceOrToAnUndefinedFluxIsRejected()
    {
        var binding = new BoundaryBinding<ShallowWater.Boundary>().Bind("inlet", ShallowWater.Boundary.Wall);
        Assert.Contains("already bound to Wall", Assert.Throws<ArgumentException>(() => binding.Bind("inlet", ShallowWater.Boundary.Outflow)).Message);
        Assert.Contains("is not a boundary flux", Assert.Throws<ArgumentException>(() => binding.Bind("outlet", (ShallowWater.Boundary)17)).Message);
        Assert.Throws<ArgumentException>(() => binding.Bind(" ", ShallowWater.Boundary.Wall));
    }

    [Fact]
    public void RebindingAfterResolvingIsSeenByTheNextResolve()
    {
        var binding = new BoundaryBinding<ShallowWater.Boundary>()
            .Bind("inlet", ShallowWater.Boundary.Outflow)
            .Bind("outlet", ShallowWater.Boundary.Outflow);
        Assert.Throws<BoundaryBindingException>(() => binding.Validate(Channel));
        binding.Bind("walls", ShallowWater.Boundary.Wall);
        binding.Validate(Channel);
        Assert.Equal(3, binding.Resolve(Channel).Length);
    }

    [Fact]
    public void AKernelOnAPeriodicGridNeedsNoBindings()
    {
        var grid = new StructuredGrid1D(GridAxis.Uniform(3, 0, 1), SideBoundary.Periodic, SideBoundary.Periodic);
        Assert.Equal(0, new BoundaryBinding<Advection.Boundary>().Resolve(grid).Length);
    }
}
