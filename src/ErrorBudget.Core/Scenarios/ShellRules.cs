namespace ErrorBudget.Core.Scenarios;

/// <summary>[[shell]] rules across keys: Walker T/P/F consistency and a perigee above the atmosphere.</summary>
internal static class ShellRules
{
    public static void Check(SectionValues shell, ScenarioErrorList errors)
    {
        CheckPlanes(shell, errors);
        CheckPhasing(shell, errors);
        CheckPerigee(shell, errors);
    }

    private static void CheckPlanes(SectionValues shell, ScenarioErrorList errors)
    {
        if (!shell.Has("satellites", "planes"))
        {
            return;
        }

        var satellites = shell.Integer("satellites");
        var planes = shell.Integer("planes");
        if (satellites % planes == 0)
        {
            return;
        }

        var divisors = string.Join(", ", Enumerable.Range(1, (int)satellites).Where(d => satellites % d == 0));
        var problem = planes > satellites ? "is more than" : "does not divide";
        shell.Fail(errors, "planes", $"{problem} {shell.Describe("satellites")}",
            $"a divisor of satellites = {satellites}: {divisors}");
    }

    private static void CheckPhasing(SectionValues shell, ScenarioErrorList errors)
    {
        if (shell.Has("planes", "phasing") && shell.Integer("phasing") > shell.Integer("planes") - 1)
        {
            shell.Fail(errors, "phasing", $"is not below {shell.Describe("planes")}",
                $"integer 0 <= phasing <= {shell.Integer("planes") - 1}");
        }
    }

    private static void CheckPerigee(SectionValues shell, ScenarioErrorList errors)
    {
        if (!shell.Has("semi_major_axis_km", "eccentricity"))
        {
            return;
        }

        var lowestKm = ScenarioSchema.EarthEquatorialRadiusKm + ScenarioSchema.MinPerigeeAltitudeKm;
        var perigeeKm = shell.Number("semi_major_axis_km") * (1.0 - shell.Number("eccentricity"));
        if (perigeeKm > lowestKm)
        {
            return;
        }

        var altitude = KeySpec.Format(Math.Round(perigeeKm - ScenarioSchema.EarthEquatorialRadiusKm, 3));
        shell.Fail(errors, "semi_major_axis_km",
            $"with {shell.Describe("eccentricity")} puts perigee a(1 - e) = {KeySpec.Format(Math.Round(perigeeKm, 3))} km at {altitude} km altitude",
            $"semi_major_axis_km * (1 - eccentricity) > {KeySpec.Format(lowestKm)} (Earth radius {KeySpec.Format(ScenarioSchema.EarthEquatorialRadiusKm)} km + {KeySpec.Format(ScenarioSchema.MinPerigeeAltitudeKm)} km)");
    }
}
