namespace ErrorBudget.Core.Tests.Integrity;

/// <summary>
/// Scenario texts for the end-to-end integrity tests. The truth is built so that the receiver's
/// assumed model is exactly right (or exactly half the truth): every truth error is Gaussian with a
/// fixed sigma (no clock growth, no orbit error, no multipath), so each range error's variance is
/// sigma_URE^2 + user(el)^2 in both models, scaled by 4 in the "twice" case.
/// </summary>
internal static class IntegrityScenarios
{
    private const string Constellation = """
        [[shell]]
        name = "halo"
        satellites = 24
        planes = 3
        phasing = 1
        inclination_deg = 56
        semi_major_axis_km = 27800
        """;

    /// <summary>Truth equal to the assumed model (ratio 1) or twice its sigma (ratio 2).</summary>
    public static string GaussianTruth(int trials, double durationH, double stepS, double sigmaRatio, string integrity) => $"""
        [run]
        seed = 29
        trials = {trials}
        duration_h = {durationH}
        step_s = {stepS}

        {Constellation}

        [grid]
        lat_step_deg = 30
        lon_step_deg = 30
        mask_deg = 10

        [clock]
        upload_sigma_m = {0.05 * sigmaRatio}
        growth_sigma_m_per_h = 0

        [orbit]
        radial_sigma_m = 0
        along_sigma_m = 0
        cross_sigma_m = 0

        [user]
        ionosphere = "single-frequency"
        iono_vertical_sigma_m = {1.0 * sigmaRatio}
        tropo_zenith_sigma_m = {0.12 * sigmaRatio}
        multipath = "none"
        noise_sigma_m = {0.36 * sigmaRatio}

        [assumed]
        ure_sigma_m = 0.05
        ionosphere = "single-frequency"
        iono_vertical_sigma_m = 1.0
        tropo_zenith_sigma_m = 0.12
        multipath = "none"
        noise_sigma_m = 0.36

        {integrity}
        """;
}
