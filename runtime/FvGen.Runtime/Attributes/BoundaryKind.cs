namespace FvGen;

/// <summary>The physical kind of a boundary flux.</summary>
public enum BoundaryKind
{
    /// <summary>A solid wall: no mass crosses it.</summary>
    Wall,

    /// <summary>A boundary where the outside state is prescribed.</summary>
    Inflow,

    /// <summary>A boundary where the flow leaves the domain.</summary>
    Outflow,

    /// <summary>A mirror plane.</summary>
    Symmetry,

    /// <summary>Anything else the user defines.</summary>
    UserDefined,
}
