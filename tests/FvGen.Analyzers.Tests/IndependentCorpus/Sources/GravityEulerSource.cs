// expect: none
// why: every component of faceFlux[•] cancels between faces i and i+1; the gravity terms read u[i].Density and u[i].Momentum of the target cell only, so they are sources.
using System;

namespace Corpus.Sources;

public struct AtmosphereColumn
{
    public double Density;
    public double Momentum;
    public double Energy;
}

/// <summary>Vertical column of stratified air: Euler fluxes plus gravity (z upwards).</summary>
public static class StratifiedColumnRate
{
    [FvGen.ConservativeUpdate]
    public static void Rate([FvGen.FaceData] AtmosphereColumn[] faceFlux, AtmosphereColumn[] u, AtmosphereColumn[] rate, double g, double dz)
    {
        for (int i = 0; i < u.Length; i++)
        {
            rate[i].Density = -(faceFlux[i + 1].Density - faceFlux[i].Density) / dz;
            rate[i].Momentum = -(faceFlux[i + 1].Momentum - faceFlux[i].Momentum) / dz - u[i].Density * g;
            rate[i].Energy = -(faceFlux[i + 1].Energy - faceFlux[i].Energy) / dz - u[i].Momentum * g;
        }
    }
}
