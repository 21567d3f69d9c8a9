using System.Globalization;
using ErrorBudget.Core.Simulation;
using ErrorBudget.Results.Summary;
using ErrorBudget.Results.Tables;

namespace ErrorBudget.Results;

/// <summary>
/// Writes a result set (cells.parquet, epochs.parquet, relativity.parquet, clocks.parquet, age_of_data.parquet,
/// availability.parquet, integrity.parquet, overbound.parquet,
/// summary.json) atomically: everything goes
/// into a fresh temporary sibling folder, which is then renamed into place. A failure at any point
/// leaves the previous state: no temporary folder, no half result set, the old folder untouched.
/// </summary>
public sealed class ResultSetWriter
{
    private ResultSetWriter()
    {
    }

    /// <summary>Writes <paramref name="result"/> as a result set folder.</summary>
    /// <param name="result">The finished run.</param>
    /// <param name="outputDirectory">The folder to create (or replace, with <paramref name="force"/>). Its parent is created if missing.</param>
    /// <param name="force">Replace an existing folder.</param>
    /// <param name="ct">Cancels the write; the output folder is then left as it was.</param>
    /// <exception cref="ResultSetExistsException">The folder exists and <paramref name="force"/> is false (nothing was written).</exception>
    public static Task WriteAsync(RunResult result, string outputDirectory, bool force, CancellationToken ct) =>
        WriteAsync(result, outputDirectory, force, ResultSetLayout.RowsPerGroup, ct);

    /// <summary>As the public overload, with the rows per Parquet row group chosen (tests use small groups).</summary>
    internal static async Task WriteAsync(RunResult result, string outputDirectory, bool force, int rowsPerGroup, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(result);
        string target = Path.TrimEndingDirectorySeparator(Path.GetFullPath(outputDirectory));
        ResultSetLayout.EnsureMayWrite(target, force);
        ct.ThrowIfCancellationRequested();

        string temp = ResultSetLayout.TemporarySibling(target);
        Directory.CreateDirectory(Path.GetDirectoryName(temp)!);
        Directory.CreateDirectory(temp);
        try
        {
            await WriteFilesAsync(result, temp, rowsPerGroup, ct);
            ct.ThrowIfCancellationRequested();
            Commit(temp, target, force);
        }
        catch
        {
            TryDelete(temp);
            throw;
        }
    }

    private static async Task WriteFilesAsync(RunResult result, string folder, int rowsPerGroup, CancellationToken ct)
    {
        var cells = CellsTable.Definition;
        await ParquetTableWriter.WriteAsync(cells, result.Cells, Path.Combine(folder, cells.FileName), Metadata(result, cells.Name), rowsPerGroup, ct);

        var epochs = EpochsTable.Definition;
        await ParquetTableWriter.WriteAsync(epochs, result.Epochs, Path.Combine(folder, epochs.FileName), Metadata(result, epochs.Name), rowsPerGroup, ct);

        var relativity = RelativityTable.Definition;
        await ParquetTableWriter.WriteAsync(relativity, result.Relativity.Satellites, Path.Combine(folder, relativity.FileName), Metadata(result, relativity.Name), rowsPerGroup, ct);
        var clocks = ClocksTable.Definition;
        await ParquetTableWriter.WriteAsync(clocks, result.Clocks, Path.Combine(folder, clocks.FileName), Metadata(result, clocks.Name), rowsPerGroup, ct);

        var ages = AgeOfDataTable.Definition;
        await ParquetTableWriter.WriteAsync(ages, result.AgeOfData, Path.Combine(folder, ages.FileName), Metadata(result, ages.Name), rowsPerGroup, ct);

        // Integrity (issue 5): empty tables without [integrity], so every result set has the same files.
        var availability = AvailabilityTable.Definition;
        await ParquetTableWriter.WriteAsync(availability, result.Integrity?.Cells ?? [], Path.Combine(folder, availability.FileName), Metadata(result, availability.Name), rowsPerGroup, ct);
        var integrity = IntegrityTable.Definition;
        await ParquetTableWriter.WriteAsync(integrity, result.Integrity?.Diagram ?? [], Path.Combine(folder, integrity.FileName), Metadata(result, integrity.Name), rowsPerGroup, ct);
        var overbound = OverboundTable.Definition;
        await ParquetTableWriter.WriteAsync(overbound, result.Integrity?.Overbound ?? [], Path.Combine(folder, overbound.FileName), Metadata(result, overbound.Name), rowsPerGroup, ct);

        ct.ThrowIfCancellationRequested();
        await using var summary = new FileStream(Path.Combine(folder, ResultSetLayout.SummaryFileName), FileMode.CreateNew, FileAccess.Write, FileShare.None);
        SummaryJsonWriter.Write(result, summary);
        summary.Flush(flushToDisk: true);
    }

    private static Dictionary<string, string> Metadata(RunResult result, string schemaName) => new()
    {
        [MetadataKeys.Scenario] = result.Scenario.SourceText,
        [MetadataKeys.ScenarioHash] = result.Metadata.ScenarioHash,
        [MetadataKeys.Seed] = result.Metadata.Seed.ToString(CultureInfo.InvariantCulture),
        [MetadataKeys.Trials] = result.Metadata.Trials.ToString(CultureInfo.InvariantCulture),
        [MetadataKeys.ToolVersion] = result.Metadata.ToolVersion,
        [MetadataKeys.Schema] = schemaName,
        [MetadataKeys.SchemaVersion] = ResultSetLayout.SchemaVersion.ToString(CultureInfo.InvariantCulture),
        [MetadataKeys.Caution] = ResultCaution.Text,
    };

    /// <summary>Renames the finished temporary folder into place; an old folder is moved aside first and deleted last.</summary>
    private static void Commit(string temp, string target, bool force)
    {
        if (!Directory.Exists(target))
        {
            // Fails (IOException) if the folder appeared meanwhile: never merge into someone else's folder.
            Directory.Move(temp, target);
            return;
        }

        // The folder appeared after the first check: the policy still holds.
        ResultSetLayout.EnsureMayWrite(target, force);
        string aside = ResultSetLayout.AsideSibling(target);
        Directory.Move(target, aside);
        try
        {
            Directory.Move(temp, target);
        }
        catch
        {
            Directory.Move(aside, target);
            throw;
        }

        // The new result set is in place; a leftover old folder is untidy but harms nothing.
        TryDelete(aside);
    }

    private static void TryDelete(string folder)
    {
        try
        {
            if (Directory.Exists(folder))
            {
                Directory.Delete(folder, recursive: true);
            }
        }
        catch (IOException)
        {
        }
        catch (UnauthorizedAccessException)
        {
        }
    }
}
