// expect: FVC0002
// why: the density outflow is added instead of subtracted, so faceFlux[•].Density collects +2 (times the cell measure) instead of cancelling.
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
            rate[i].Density = (faceFlux[i].Density + faceFlux[i + 1].Density) / width[i];
            rate[i].Momentum = (faceFlux[i].Momentum - faceFlux[i + 1].Momentum) / width[i];
            rate[i].Energy = (faceFlux[i].Energy - faceFlux[i + 1].Energy) / width[i];
        }
    }
}
