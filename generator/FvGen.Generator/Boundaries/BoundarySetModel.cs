using FvGen.Generator.Common;
using FvGen.Generator.Fluxes;

namespace FvGen.Generator.Boundaries;

/// <summary>
/// The boundary fluxes declared in one type, from which the generator writes the nested
/// <c>Boundary</c> enum that <c>BoundaryBinding&lt;Boundary&gt;</c> binds patches to. Equatable; no symbols.
/// </summary>
internal sealed record BoundarySetModel(TypeLocation Location, EquatableArray<BoundaryFluxEntry> Fluxes);

/// <summary>One boundary flux found by the pipeline, before grouping by type.</summary>
internal sealed record BoundaryFluxFound(TypeLocation Location, BoundaryFluxEntry Entry);
