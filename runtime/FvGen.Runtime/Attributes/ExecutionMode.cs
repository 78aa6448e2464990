namespace FvGen;

/// <summary>How a generated face loop runs.</summary>
public enum ExecutionMode
{
    /// <summary>One thread; each face flux subtracted from the cell behind it and added to the cell in front.</summary>
    SerialScatter,

    /// <summary>
    /// Face fluxes into a face buffer in parallel, then each cell sums its faces in a fixed order.
    /// The result is bitwise identical for any number of threads.
    /// </summary>
    ParallelGather,

    /// <summary>Parallel scatter over a face colouring computed once per mesh: no two faces of one colour share a cell.</summary>
    ParallelColouredScatter,
}
