namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// [relativity] rules across keys and tables: a preset orbit exactly when frequency_offset = "preset", and no
/// factor on a term that is missed (it would silently do nothing).
/// </summary>
internal static class RelativityRules
{
    private const string PresetKey = "preset_semi_major_axis_km";

    public static void Check(SectionValues relativity, IReadOnlyList<SectionValues> shells, TomlDocument tree, ScenarioErrorList errors)
    {
        CheckPreset(relativity, shells, tree, errors);
        CheckFactor(relativity, "frequency_offset", "frequency_offset_factor", "\"applied\" or \"preset\"", errors);
        CheckFactor(relativity, "eccentricity_term", "eccentricity_factor", "\"applied\"", errors);
    }

    private static void CheckPreset(SectionValues relativity, IReadOnlyList<SectionValues> shells, TomlDocument tree, ScenarioErrorList errors)
    {
        if (!relativity.Has("frequency_offset"))
        {
            return;
        }

        bool preset = relativity.Text("frequency_offset") == RelativityKeys.Preset;
        string shellKey = RelativityKeys.ShellPreset.Name;
        if (!preset)
        {
            string why = $"is used only with relativity.frequency_offset = \"preset\" (here {relativity.TextOf("frequency_offset")})";
            const string allowed = "leave it out, or set relativity.frequency_offset = \"preset\"";
            if (relativity.Has(PresetKey))
            {
                relativity.Fail(errors, PresetKey, why, allowed);
            }

            foreach (var shell in shells.Where(s => s.Has(shellKey)))
            {
                shell.Fail(errors, shellKey, why, allowed);
            }

            return;
        }

        if (Written(tree, "relativity", PresetKey))
        {
            return; // present, or already reported as a bad value
        }

        var without = shells.Where((s, i) => !s.Has(shellKey) && !Written(tree, "shell", shellKey, i + 1)).Select(s => s.Path).ToList();
        if (without.Count > 0)
        {
            relativity.Fail(errors, "frequency_offset", $"needs the orbit the offset was set for, and {string.Join(", ", without)} has none",
                $"relativity.{PresetKey} (> {KeySpec.Format(ScenarioSchema.EarthEquatorialRadiusKm)}, <= 100000), or shell.{shellKey} on every shell");
        }
    }

    private static void CheckFactor(SectionValues relativity, string modeKey, string factorKey, string modes, ScenarioErrorList errors)
    {
        if (relativity.Has(modeKey, factorKey) && relativity.Text(modeKey) == RelativityKeys.Missed && relativity.Number(factorKey) != 1.0)
        {
            relativity.Fail(errors, factorKey, $"has no effect with {relativity.Describe(modeKey)} (nothing is applied)",
                $"1 (the default), or {modeKey} = {modes} to apply a fraction");
        }
    }

    /// <summary>True when the key is written in the table (valid or not); <paramref name="index"/> counts [[array]] elements from 1.</summary>
    private static bool Written(TomlDocument tree, string table, string key, int index = 0) =>
        tree.Sections.Exists(s => s.Name == table && (index == 0 || s.Index == index) && s.Entries.Exists(e => e.Key == key));
}
