using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using ErrorBudget.Results.Tests.TestData;

namespace ErrorBudget.Results.Tests.Summary;

public class SummaryJsonTests
{
    [Fact]
    public async Task Summary_numbers_round_trip_exactly_and_NaN_figures_are_null()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);

        using var doc = JsonDocument.Parse(File.ReadAllText(Path.Combine(temp.Output, ResultSetLayout.SummaryFileName)));
        var root = doc.RootElement;

        // Tolerance: exact. System.Text.Json writes the shortest text that parses back to the same double.
        Assert.Equal(12.345678901234567, root.GetProperty("run_seconds").GetDouble());
        Assert.Equal(1.0 / 18.0, root.GetProperty("unavailable_fraction").GetDouble());
        Assert.Equal(SyntheticRun.Seed, root.GetProperty("seed").GetUInt64()); // 2^53 + 1 survives as an integer
        Assert.Equal(1, root.GetProperty("schema_version").GetInt32());
        Assert.Equal(3, root.GetProperty("trials").GetInt32());
        Assert.Equal(2, root.GetProperty("threads").GetInt32());
        Assert.Equal(3, root.GetProperty("epochs").GetInt32());
        Assert.Equal(6, root.GetProperty("cells").GetInt32());
        Assert.Equal(27, root.GetProperty("satellites").GetInt32()); // shells of 24 + 3
        Assert.Equal(54, root.GetProperty("samples").GetInt64());
        Assert.Equal("synthetic.toml", root.GetProperty("scenario_name").GetString());
        Assert.Equal("2031-06-01T12:34:56Z", root.GetProperty("started_utc").GetString());
        Assert.Equal(2.8, root.GetProperty("hpe").GetProperty("p95_m").GetDouble());
        Assert.Equal(JsonValueKind.Null, root.GetProperty("hpe").GetProperty("p999_m").ValueKind);
        Assert.Equal(5, root.GetProperty("worst_cell_hpe").GetProperty("cell_index").GetInt32());
        Assert.Equal(3.5, root.GetProperty("worst_cell_hpe").GetProperty("p95_m").GetDouble());
        Assert.Equal(-1, root.GetProperty("worst_cell_vpe").GetProperty("cell_index").GetInt32());
        Assert.Equal(JsonValueKind.Null, root.GetProperty("worst_cell_vpe").GetProperty("lat_deg").ValueKind);
        Assert.Equal(ResultCaution.Text, root.GetProperty("caution").GetString());
    }

    // Invariant globalization is on (Directory.Build.props), so new CultureInfo("de-DE") throws
    // CultureNotFoundException. A clone of the invariant culture with a comma decimal separator is
    // allowed and formats 0.5 as "0,5": it stands in for a comma locale.
    [Fact]
    public async Task Summary_under_a_comma_decimal_culture_equals_the_golden_text_with_point_decimals()
    {
        var comma = (CultureInfo)CultureInfo.InvariantCulture.Clone();
        comma.NumberFormat.NumberDecimalSeparator = ",";
        comma.NumberFormat.NumberGroupSeparator = ".";
        var saved = CultureInfo.CurrentCulture;
        using var temp = new TempFolder();
        string text;
        try
        {
            CultureInfo.CurrentCulture = comma;
            Assert.Equal("0,5", 0.5.ToString(CultureInfo.CurrentCulture)); // the culture really is a comma culture
            await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);
            text = await File.ReadAllTextAsync(Path.Combine(temp.Output, ResultSetLayout.SummaryFileName));
        }
        finally
        {
            CultureInfo.CurrentCulture = saved;
        }

        Assert.DoesNotMatch(new Regex(@"\d,\d"), text);
        Assert.Equal(Golden + "\n", text);
    }

    private const string Golden = """
        {
          "schema_version": 1,
          "tool_version": "0.1.0-test+abc123",
          "scenario_name": "synthetic.toml",
          "scenario_hash": "3f2a9c0d4b5e6f708192a3b4c5d6e7f8091a2b3c4d5e6f708192a3b4c5d6e7f8",
          "seed": 9007199254740993,
          "trials": 3,
          "method": "monte-carlo",
          "threads": 2,
          "started_utc": "2031-06-01T12:34:56Z",
          "run_seconds": 12.345678901234567,
          "epochs": 3,
          "cells": 6,
          "satellites": 27,
          "samples": 54,
          "unavailable_fraction": 0.05555555555555555,
          "hpe": {
            "p50_m": 1.3,
            "p95_m": 2.8,
            "p99_m": 4.1,
            "p999_m": null
          },
          "vpe": {
            "p50_m": 2.2,
            "p95_m": 5.1,
            "p99_m": 7.9,
            "p999_m": null
          },
          "worst_cell_hpe": {
            "cell_index": 5,
            "lat_deg": 15,
            "lon_deg": 150,
            "p95_m": 3.5
          },
          "worst_cell_vpe": {
            "cell_index": -1,
            "lat_deg": null,
            "lon_deg": null,
            "p95_m": null
          },
          "relativity_position": {
            "user_epochs": 0,
            "hpe_rms_m": null,
            "hpe_max_m": null,
            "vpe_rms_m": null,
            "vpe_max_m": null,
            "receiver_clock_rms_m": null
          },
          "batches": 1,
          "hpe_ci": {
            "p50_lower_m": null,
            "p50_upper_m": null,
            "p95_lower_m": null,
            "p95_upper_m": null,
            "p99_lower_m": null,
            "p99_upper_m": null,
            "p999_lower_m": null,
            "p999_upper_m": null
          },
          "vpe_ci": {
            "p50_lower_m": null,
            "p50_upper_m": null,
            "p95_lower_m": null,
            "p95_upper_m": null,
            "p99_lower_m": null,
            "p99_upper_m": null,
            "p999_lower_m": null,
            "p999_upper_m": null
          },
          "integrity": {
            "service": "",
            "protection_levels": "",
            "hal_m": null,
            "val_m": null,
            "availability": null,
            "availability_target": null,
            "coverage": null,
            "h95_requirement_m": null,
            "v95_requirement_m": null,
            "accuracy_area_share": null,
            "mi_horizontal_events": 0,
            "mi_horizontal_rate": null,
            "mi_horizontal_rate_upper": null,
            "mi_vertical_events": 0,
            "mi_vertical_rate": null,
            "mi_vertical_rate_upper": null,
            "hmi_horizontal_events": 0,
            "hmi_horizontal_rate": null,
            "hmi_horizontal_rate_upper": null,
            "hmi_vertical_events": 0,
            "hmi_vertical_rate": null,
            "hmi_vertical_rate_upper": null,
            "detection_events": 0,
            "detection_rate": null,
            "detection_rate_upper": null,
            "missed_detection_events": 0,
            "missed_detection_rate": null,
            "missed_detection_rate_upper": null,
            "exclusions": 0,
            "faulted_samples": 0,
            "worst_required_inflation": null,
            "worst_overbound_group": ""
          },
          "caution": "Results are for design studies only: they certify nothing, and the applicable standards, local regulations and licensed practice take precedence."
        }
        """;
}
