// expect: FVC0001
// why: the momentum rate takes faceFlux[i + 1].Energy as its outflow, so faceFlux[•].Momentum enters with no counterpart and faceFlux[•].Energy leaves the momentum with none.
using System;

namespace Corpus.Euler1D;

public struct ReactorGas
{
    public double Density;
    public double Momentum;
    public double Energy;
}

/// <summary>Euler rate on a stretched grid that clusters cells near a detonation front.</summary>
public static class StretchedGridRate
{
    [FvGen.ConservativeUpdate]
    public static void Rate([FvGen.FaceData] ReactorGas[] faceFlux, double[] width, ReactorGas[] rate)
    {
        for (int i = 0; i < width.Length; i++)
        {
            rate[i].Density = (faceFlux[i].Density - faceFlux[i + 1].Density) / width[i];
            rate[i].Momentum = (faceFlux[i].Momentum - faceFlux[i + 1].Energy) / width[i];
            rate[i].Energy = (faceFlux[i].Energy - faceFlux[i + 1].Energy) / width[i];
        }
    }
}
