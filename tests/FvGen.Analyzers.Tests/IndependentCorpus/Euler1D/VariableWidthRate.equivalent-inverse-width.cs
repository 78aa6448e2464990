// expect: none
// why: the cell measure is applied as a multiplication by a local inverse 1/width[i]; inlined, every term still carries width[i] to the power -1, so it is the cell measure and the face terms cancel.
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
            double inverseWidth = 1.0 / width[i];
            rate[i].Density = (faceFlux[i].Density - faceFlux[i + 1].Density) * inverseWidth;
            rate[i].Momentum = (faceFlux[i].Momentum - faceFlux[i + 1].Momentum) * inverseWidth;
            rate[i].Energy = (faceFlux[i].Energy - faceFlux[i + 1].Energy) * inverseWidth;
        }
    }
}
