// Per-cell residual written through a ref local to the cell's state struct.
// mutant: FVC0001 copy-paste-component: `- flux[i].Energy) / dx;` -> `- flux[i].Momentum) / dx;`
// mutant: FVC0002 flipped-sign: `-(flux[i + 1].Mass - flux[i].Mass)` -> `-(flux[i + 1].Mass + flux[i].Mass)`
// mutant: FVC0001 dropped-term: `(flux[i + 1].Momentum - flux[i].Momentum)` -> `flux[i + 1].Momentum`
using System;
using FvGen;

public struct Cell3
{
    public double Mass;
    public double Momentum;
    public double Energy;
}

public static class RefLocalResidual
{
    [ConservativeUpdate]
    public static void Residual([FaceData] Cell3[] flux, Cell3[] residual, double dx)
    {
        for (int i = 0; i < residual.Length; i++)
        {
            ref Cell3 ri = ref residual[i];
            ri.Mass = -(flux[i + 1].Mass - flux[i].Mass) / dx;
            ri.Momentum = -(flux[i + 1].Momentum - flux[i].Momentum) / dx;
            ri.Energy = -(flux[i + 1].Energy - flux[i].Energy) / dx;
        }
    }
}
