using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Relativity;

/// <summary>Small scenarios for the relativity integration tests: invented shells, a [relativity] table of choice.</summary>
internal static class RelativityScenarios
{
    /// <summary>Circular Walker 24/3/1 at 55 deg.</summary>
    public static string Shell(string name, double semiMajorAxisKm, double eccentricity = 0.0, string extra = "") => $"""

        [[shell]]
        name = "{name}"
        satellites = 24
        planes = 3
        phasing = 1
        inclination_deg = 55
        semi_major_axis_km = {semiMajorAxisKm.ToString(System.Globalization.CultureInfo.InvariantCulture)}
        eccentricity = {eccentricity.ToString(System.Globalization.CultureInfo.InvariantCulture)}
        {extra}

        """;

    /// <summary>
    /// A scenario with the given shells and [relativity] lines; 6 h at 1800 s, 30 deg grid, 10 deg mask. With
    /// <paramref name="quiet"/> every other error source is zero, so the relativistic terms are alone.
    /// </summary>
    public static Scenario Load(string shells, string relativity, bool quiet = true, int trials = 4, double durationH = 6, double stepS = 1800)
    {
        string others = quiet
            ? """

              [clock]
              upload_sigma_m = 0
              growth_sigma_m_per_h = 0

              [orbit]
              radial_sigma_m = 0
              along_sigma_m = 0
              cross_sigma_m = 0

              [user]
              tropo_zenith_sigma_m = 0
              multipath = "none"
              noise_sigma_m = 0
              """
            : "";
        string text = $"""
            [run]
            seed = 17
            trials = {trials}
            duration_h = {durationH.ToString(System.Globalization.CultureInfo.InvariantCulture)}
            step_s = {stepS.ToString(System.Globalization.CultureInfo.InvariantCulture)}
            {shells}
            [grid]
            lat_step_deg = 30
            lon_step_deg = 30
            mask_deg = 10
            {others}

            [relativity]
            {relativity}
            """;
        return ScenarioLoader.Load(text, "relativity-test.toml");
    }
}
