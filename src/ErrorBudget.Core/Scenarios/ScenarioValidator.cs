namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// Checks a flattened scenario file table by table: unknown or missing tables, then each table's
/// keys (<see cref="SectionReader"/>), then the cross-key rules. Reports every problem found.
/// </summary>
internal static class ScenarioValidator
{
    public static ScenarioValues Validate(TomlDocument tree, ScenarioErrorList errors)
    {
        foreach (var entry in tree.RootEntries)
        {
            errors.Key(entry.Line, entry.Key, entry.ValueText, "is outside any table",
                $"keys inside the tables {ScenarioSchema.TableList}");
        }

        foreach (var section in tree.Sections)
        {
            CheckHeader(section, errors);
        }

        var run = ReadSingle(tree, ScenarioSchema.Run, errors);
        RunRules.Check(run, errors);
        var shells = ReadShells(tree, errors);
        var grid = ReadSingle(tree, ScenarioSchema.Grid, errors);
        GridRules.Check(grid, errors);
        var clock = ReadSingle(tree, ScenarioSchema.Clock, errors);
        ClockRules.Check(clock, run, shells, errors);
        var values = new ScenarioValues(
            run,
            shells,
            grid,
            clock,
            ReadSingle(tree, ScenarioSchema.Orbit, errors),
            ReadSingle(tree, ScenarioSchema.User, errors),
            ReadSingle(tree, ScenarioSchema.Assumed, errors))
        {
            Relativity = ReadSingle(tree, ScenarioSchema.Relativity, errors),
        };
        RelativityRules.Check(values.Relativity, shells, tree, errors);
        bool hasIntegrity = tree.Sections.Exists(s => s.Name == IntegrityKeys.Integrity.Name);
        bool hasFaults = tree.Sections.Exists(s => s.Name == IntegrityKeys.Faults.Name);
        var integrity = ReadSingle(tree, IntegrityKeys.Integrity, errors);
        var faults = ReadSingle(tree, IntegrityKeys.Faults, errors);
        IntegrityKeys.Check(integrity, faults, hasIntegrity, errors);
        return values with { Integrity = hasIntegrity ? integrity : null, Faults = hasFaults ? faults : null };
    }

    private static void CheckHeader(TomlSection section, ScenarioErrorList errors)
    {
        var spec = ScenarioSchema.Find(section.Name);
        if (spec is null)
        {
            errors.Table(section.Line, section.Name, section.Written, "is not a known table", ScenarioSchema.TableList);
        }
        else if (spec.IsArray != section.WrittenAsArray)
        {
            var why = spec.IsArray ? "an array of tables, one per shell" : "a single table";
            errors.Table(section.Line, section.Name, section.Written, $"has the wrong brackets: {spec.Name} is {why}", spec.Written);
        }
    }

    private static SectionValues ReadSingle(TomlDocument tree, TableSpec spec, ScenarioErrorList errors)
    {
        var section = tree.Sections.Find(s => s.Name == spec.Name);
        if (section is null && spec.Required)
        {
            errors.Table(0, spec.Name, spec.Written, "is missing", $"a {spec.Written} table with keys {spec.KeyList}");
        }

        return SectionReader.Read(section, spec, spec.Name, errors);
    }

    private static List<SectionValues> ReadShells(TomlDocument tree, ScenarioErrorList errors)
    {
        var spec = ScenarioSchema.Shell;
        var sections = tree.Sections.Where(s => s.Name == spec.Name).ToList();
        if (sections.Count == 0)
        {
            errors.Table(0, spec.Name, spec.Written, "is missing",
                $"1 to {ScenarioSchema.MaxShells} {spec.Written} tables with keys {spec.KeyList}");
        }

        var shells = new List<SectionValues>();
        for (var i = 0; i < sections.Count; i++)
        {
            var path = $"{spec.Name}[{i + 1}]";
            if (i == ScenarioSchema.MaxShells)
            {
                errors.Table(sections[i].Line, path, path, $"is more than the {ScenarioSchema.MaxShells} shells allowed",
                    $"1 to {ScenarioSchema.MaxShells} {spec.Written} tables");
            }

            var shell = SectionReader.Read(sections[i], spec, path, errors);
            ShellRules.Check(shell, errors);
            shells.Add(shell);
        }

        CheckUniqueNames(shells, errors);
        return shells;
    }

    private static void CheckUniqueNames(List<SectionValues> shells, ScenarioErrorList errors)
    {
        var seen = new Dictionary<string, SectionValues>(StringComparer.Ordinal);
        for (var i = 0; i < shells.Count; i++)
        {
            var name = ShellName(shells[i], i);
            if (seen.TryGetValue(name, out var first))
            {
                var at = shells[i].Has("name") ? "name" : null;
                if (at is not null)
                {
                    shells[i].Fail(errors, at, $"repeats the name of {first.Path}", "a name no other shell uses");
                }
                else
                {
                    errors.Key(shells[i].TableLine, shells[i].KeyPath("name"), "", $"defaults to \"{name}\", which {first.Path} already uses",
                        "a name no other shell uses");
                }

                continue;
            }

            seen[name] = shells[i];
        }
    }

    /// <summary>The shell's name, or "shell-N" (N counted from 1) when left out.</summary>
    public static string ShellName(SectionValues shell, int index) =>
        shell.Has("name") ? shell.Text("name") : $"shell-{index + 1}";
}
