namespace ErrorBudget.Core.Orbits;

/// <summary>
/// Classical Keplerian elements of a two-body orbit at the scenario start (t = 0).
/// Frame: the quasi-inertial frame whose x axis is the Earth-fixed x axis at the start rotated back
/// about z by the start rotation angle theta0 (so ECEF = Rz(-(theta0 + omegaE t)) applied to inertial,
/// see <see cref="Geodesy.EarthRotation.InertialToEarthFixed(Numerics.Vec3, double)"/>); z is the Earth's
/// rotation axis. RAAN is therefore measured in that inertial frame, not from Greenwich.
/// </summary>
/// <param name="SemiMajorAxisMeters">a, metres. Range: a (1 - e) above the Earth's surface.</param>
/// <param name="Eccentricity">e, unitless. Range: [0, 1); scenarios allow [0, 0.9].</param>
/// <param name="InclinationRad">i, radians. Range: [0, pi].</param>
/// <param name="RaanRad">Right ascension of the ascending node Omega, radians (inertial).</param>
/// <param name="ArgumentOfPerigeeRad">omega, radians from the ascending node in the direction of motion.</param>
/// <param name="MeanAnomalyAtStartRad">M0 at t = 0, radians.</param>
public readonly record struct KeplerElements(
    double SemiMajorAxisMeters,
    double Eccentricity,
    double InclinationRad,
    double RaanRad,
    double ArgumentOfPerigeeRad,
    double MeanAnomalyAtStartRad);
