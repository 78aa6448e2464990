// expect: none
// why: width[i] divides every term of each write and is the cell measure; multiplied out, every component of faceFlux[•] cancels between faces i+1 and i.
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
            rate[i].Momentum = (faceFlux[i].Momentum - faceFlux[i + 1].Momentum) / width[i];
            rate[i].Energy = (faceFlux[i].Energy - faceFlux[i + 1].Energy) / width[i];
        }
    }
}
