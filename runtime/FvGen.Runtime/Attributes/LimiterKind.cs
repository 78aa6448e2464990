namespace FvGen;

/// <summary>Slope limiters, as functions of the ratio θ of consecutive slopes (LeVeque 2002, ch. 6).</summary>
public enum LimiterKind
{
    /// <summary>φ(θ) = max(0, min(1, θ)).</summary>
    Minmod,

    /// <summary>φ(θ) = (θ + |θ|) / (1 + |θ|).</summary>
    VanLeer,

    /// <summary>Monotonized central: φ(θ) = max(0, min((1 + θ)/2, 2, 2θ)).</summary>
    MonotonizedCentral,

    /// <summary>φ(θ) = max(0, min(1, 2θ), min(2, θ)).</summary>
    Superbee,

    /// <summary>Barth–Jespersen, for unstructured meshes.</summary>
    BarthJespersen,
}
