namespace ErrorBudget.Core.Scenarios;

/// <summary>[grid] rules across keys: ordered edges, a non-empty grid and a bounded cell count.</summary>
internal static class GridRules
{
    public static void Check(SectionValues grid, ScenarioErrorList errors)
    {
        var rows = Axis(grid, errors, "lat", "latitude");
        var columns = Axis(grid, errors, "lon", "longitude");
        if (rows is { } r && columns is { } c && r * c > ScenarioSchema.MaxCells)
        {
            grid.Fail(errors, "lat_step_deg",
                $"with {grid.Describe("lon_step_deg")} gives {KeySpec.Format(r)} x {KeySpec.Format(c)} = {KeySpec.Format(r * c)} cells",
                $"at most {ScenarioSchema.MaxCells} cells");
        }
    }

    /// <summary>Checks one axis; returns its cell count (as a double: no overflow) or null when invalid.</summary>
    private static double? Axis(SectionValues grid, ScenarioErrorList errors, string axis, string word)
    {
        string min = $"{axis}_min_deg", max = $"{axis}_max_deg", step = $"{axis}_step_deg";
        if (!grid.Has(min, max))
        {
            return null;
        }

        var span = grid.Number(max) - grid.Number(min);
        var limit = axis == "lat" ? 180.0 : 360.0;
        if (span <= 0 || span > limit)
        {
            // Blame the edge the user wrote (a default edge sits on the table line).
            var key = grid.LineOf(max) != grid.TableLine || grid.LineOf(min) == grid.TableLine ? max : min;
            var other = key == max ? min : max;
            grid.Fail(errors, key, $"with {grid.Describe(other)} spans {KeySpec.Format(span)} deg",
                $"0 < {max} - {min} <= {KeySpec.Format(limit)}");
            return null;
        }

        if (!grid.Has(step))
        {
            return null;
        }

        // Same count as GridSpec.Rows / Columns.
        var cells = Math.Floor(span / grid.Number(step) + 1e-9);
        if (cells < 1)
        {
            grid.Fail(errors, step, $"is larger than the {word} span {max} - {min} = {KeySpec.Format(span)} deg, which leaves an empty grid",
                $"0 < {step} <= {KeySpec.Format(span)}");
            return null;
        }

        return cells;
    }
}
