namespace ErrorBudget.Core.Simulation;

/// <summary>
/// Seconds of thread time per stage (summed over workers; the satellite stage runs on its own, one
/// epoch at a time). Geometry: visibility, least squares, DOPs, PLs, Cholesky; user normals: the
/// three ENU streams; projection: satellite errors through S plus L z, HPE/VPE and sketch keys;
/// sketches: the bulk inserts; integrity: tallies, diagram, overbounding samples.
/// </summary>
public sealed record StageTimes(
    double SatelliteErrorsSeconds,
    double GeometrySeconds,
    double UserNormalsSeconds,
    double ProjectionSeconds,
    double SketchesSeconds,
    double IntegritySeconds);
