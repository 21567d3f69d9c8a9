namespace ErrorBudget.Results;

/// <summary>
/// The one place that knows what a result set folder holds and when it may be replaced:
/// file names, the schema version, temporary and aside folder names, and the overwrite policy.
/// </summary>
public static class ResultSetLayout
{
    /// <summary>Per-cell table, one row per grid cell.</summary>
    public const string CellsFileName = "cells.parquet";

    /// <summary>Per-epoch table, one row per epoch.</summary>
    public const string EpochsFileName = "epochs.parquet";

    /// <summary>Per-satellite relativistic figures, one row per satellite.</summary>
    public const string RelativityFileName = "relativity.parquet";
    /// <summary>Clock grade table: model and simulated Allan deviation per tau.</summary>
    public const string ClocksFileName = "clocks.parquet";

    /// <summary>Satellite clock and orbit range errors by age of data.</summary>
    public const string AgeOfDataFileName = "age_of_data.parquet";

    /// <summary>Per-cell availability and integrity events ([integrity]).</summary>
    public const string AvailabilityFileName = "availability.parquet";

    /// <summary>Integrity diagram: 2-D histogram of (protection level, error).</summary>
    public const string IntegrityFileName = "integrity.parquet";

    /// <summary>Overbounding check per shell and elevation bin.</summary>
    public const string OverboundFileName = "overbound.parquet";

    /// <summary>Run summary (service-area figures and provenance).</summary>
    public const string SummaryFileName = "summary.json";

    /// <summary>Version of the result set layout and of the documents in results-schema/; bump on any column change.</summary>
    public const int SchemaVersion = 1;

    /// <summary>Rows per Parquet row group: the writer buffers one column chunk, so large tables are split.</summary>
    public const int RowsPerGroup = 100_000;

    /// <summary>
    /// Overwrite policy: an existing folder is replaced only with <paramref name="force"/>; a file in
    /// its place is never replaced.
    /// </summary>
    /// <exception cref="ResultSetExistsException">The folder exists and <paramref name="force"/> is false.</exception>
    /// <exception cref="IOException">A file (not a folder) has the output folder's name.</exception>
    public static void EnsureMayWrite(string outputDirectory, bool force)
    {
        if (File.Exists(outputDirectory))
        {
            throw new IOException($"'{outputDirectory}' is a file, not a result set folder; choose another output folder.");
        }

        if (Directory.Exists(outputDirectory) && !force)
        {
            throw new ResultSetExistsException(outputDirectory);
        }
    }

    /// <summary>A fresh temporary sibling of the output folder: <c>.&lt;name&gt;.tmp-&lt;random&gt;</c>.</summary>
    internal static string TemporarySibling(string outputDirectory) => Sibling(outputDirectory, "tmp");

    /// <summary>Where the replaced folder waits until the new one is in place: <c>.&lt;name&gt;.old-&lt;random&gt;</c>.</summary>
    internal static string AsideSibling(string outputDirectory) => Sibling(outputDirectory, "old");

    /// <summary>True for the names <see cref="TemporarySibling"/> and <see cref="AsideSibling"/> give for this folder.</summary>
    internal static bool IsWorkSibling(string outputDirectory, string candidateName)
    {
        string name = Path.GetFileName(outputDirectory);
        return candidateName.StartsWith($".{name}.tmp-", StringComparison.Ordinal)
            || candidateName.StartsWith($".{name}.old-", StringComparison.Ordinal);
    }

    private static string Sibling(string outputDirectory, string kind)
    {
        string parent = Path.GetDirectoryName(outputDirectory)
            ?? throw new ArgumentException($"'{outputDirectory}' has no parent folder.", nameof(outputDirectory));
        string random = Convert.ToHexStringLower(System.Security.Cryptography.RandomNumberGenerator.GetBytes(6));
        return Path.Combine(parent, $".{Path.GetFileName(outputDirectory)}.{kind}-{random}");
    }
}
