using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Scenarios;

/// <summary>A small valid scenario and helpers to break it one line at a time.</summary>
internal static class ScenarioText
{
    public const string Source = "test.toml";

    /// <summary>Valid: 12/3/1 shell, 30 deg grid (6 x 12 = 72 cells), 2 h at 600 s (12 epochs).</summary>
    public const string Valid = """
        [run]
        trials = 10
        duration_h = 2
        step_s = 600

        [[shell]]
        satellites = 12
        planes = 3
        phasing = 1
        inclination_deg = 55
        semi_major_axis_km = 27600

        [grid]
        lat_step_deg = 30
        lon_step_deg = 30
        mask_deg = 10

        """;

    /// <summary><see cref="Valid"/> with one exact line replaced (the line must exist once).</summary>
    public static string With(string line, string replacement, string text = Valid)
    {
        var lines = text.Split('\n');
        var index = Array.FindIndex(lines, l => l == line);
        Assert.True(index >= 0, $"test setup: line '{line}' not found");
        lines[index] = replacement;
        return string.Join('\n', lines);
    }

    /// <summary>1-based line number of the first line equal to <paramref name="line"/>.</summary>
    public static int LineOf(string text, string line) => Array.FindIndex(text.Split('\n'), l => l == line) + 1;

    /// <summary>Loads <paramref name="text"/>, asserting it is rejected; returns every error.</summary>
    public static IReadOnlyList<ScenarioError> Errors(string text)
    {
        var exception = Assert.Throws<ScenarioException>(() => ScenarioLoader.Load(text, Source));
        Assert.NotEmpty(exception.Errors);
        Assert.Equal(string.Join('\n', exception.Errors.Select(e => e.Message)), exception.Message);
        return exception.Errors;
    }

    /// <summary>The single error of a text with exactly one problem, checked for key and line.</summary>
    public static ScenarioError SingleError(string text, string key, int line)
    {
        var error = Assert.Single(Errors(text));
        Assert.Equal(key, error.Key);
        Assert.Equal(line, error.Line);
        Assert.StartsWith(line > 0 ? $"{Source}:{line}: " : $"{Source}: ", error.Message, StringComparison.Ordinal);
        return error;
    }
}
