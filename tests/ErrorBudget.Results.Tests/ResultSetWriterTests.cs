using ErrorBudget.Core.Simulation;
using ErrorBudget.Results.Tests.TestData;

namespace ErrorBudget.Results.Tests;

public class ResultSetWriterTests
{
    private static readonly string[] ResultFiles =
    [
        ResultSetLayout.CellsFileName, ResultSetLayout.EpochsFileName, ResultSetLayout.RelativityFileName,
        ResultSetLayout.ClocksFileName, ResultSetLayout.AgeOfDataFileName, ResultSetLayout.AvailabilityFileName,
        ResultSetLayout.IntegrityFileName, ResultSetLayout.OverboundFileName, ResultSetLayout.SummaryFileName,
    ];

    [Fact]
    public async Task New_folder_holds_exactly_the_nine_result_files_and_no_work_folder_is_left()
    {
        using var temp = new TempFolder();

        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);

        Assert.Equal(ResultFiles.Order(StringComparer.Ordinal), FilesIn(temp.Output));
        Assert.Equal(["run-out"], temp.Entries());
    }

    [Fact]
    public async Task Missing_parent_folders_are_created()
    {
        using var temp = new TempFolder();
        string nested = Path.Combine(temp.Root, "a", "b", "out");

        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), nested, force: false, CancellationToken.None);

        Assert.Equal(ResultFiles.Order(StringComparer.Ordinal), FilesIn(nested));
    }

    [Fact]
    public async Task Existing_folder_without_force_throws_naming_the_folder_and_leaves_everything_untouched()
    {
        using var temp = new TempFolder();
        Directory.CreateDirectory(temp.Output);
        File.WriteAllText(Path.Combine(temp.Output, "keep.txt"), "old");
        var before = temp.Entries();

        var error = await Assert.ThrowsAsync<ResultSetExistsException>(
            () => ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None));

        Assert.Contains(temp.Output, error.Message, StringComparison.Ordinal);
        Assert.Contains("--force", error.Message, StringComparison.Ordinal);
        Assert.Equal(Path.GetFullPath(temp.Output), error.OutputDirectory);
        Assert.Equal(before, temp.Entries());
        Assert.Equal(["keep.txt"], FilesIn(temp.Output));
        Assert.Equal("old", File.ReadAllText(Path.Combine(temp.Output, "keep.txt")));
    }

    [Fact]
    public async Task Existing_folder_with_force_is_replaced_whole()
    {
        using var temp = new TempFolder();
        Directory.CreateDirectory(Path.Combine(temp.Output, "sub"));
        File.WriteAllText(Path.Combine(temp.Output, "keep.txt"), "old");
        File.WriteAllText(Path.Combine(temp.Output, ResultSetLayout.SummaryFileName), "stale");

        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: true, CancellationToken.None);

        Assert.Equal(ResultFiles.Order(StringComparer.Ordinal), FilesIn(temp.Output));
        Assert.False(Directory.Exists(Path.Combine(temp.Output, "sub")));
        Assert.StartsWith("{", File.ReadAllText(Path.Combine(temp.Output, ResultSetLayout.SummaryFileName)), StringComparison.Ordinal);
        Assert.Equal(["run-out"], temp.Entries());
    }

    [Fact]
    public async Task A_file_in_place_of_the_folder_is_refused_even_with_force()
    {
        using var temp = new TempFolder();
        File.WriteAllText(temp.Output, "not a folder");

        await Assert.ThrowsAsync<IOException>(
            () => ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: true, CancellationToken.None));

        Assert.Equal("not a folder", File.ReadAllText(temp.Output));
        Assert.Equal(["run-out"], temp.Entries());
    }

    [Theory]
    [InlineData(0)] // first row of the first table
    [InlineData(3)] // partway through cells.parquet
    public async Task Failure_partway_through_the_cells_leaves_no_output_and_no_work_folder(int failingRow)
    {
        using var temp = new TempFolder();
        var cells = new HookedList<CellResult>(SyntheticRun.Cells(), i => { if (i == failingRow) throw new InjectedFailureException(); });

        await Assert.ThrowsAsync<InjectedFailureException>(
            () => ResultSetWriter.WriteAsync(SyntheticRun.With(cells, SyntheticRun.Epochs()), temp.Output, force: false, CancellationToken.None));

        Assert.Empty(temp.Entries());
    }

    [Fact]
    public async Task Failure_in_the_second_table_with_force_keeps_the_old_folder_as_it_was()
    {
        using var temp = new TempFolder();
        Directory.CreateDirectory(temp.Output);
        File.WriteAllText(Path.Combine(temp.Output, "keep.txt"), "old");
        var epochs = new HookedList<EpochResult>(SyntheticRun.Epochs(), i => { if (i == 2) throw new InjectedFailureException(); });

        await Assert.ThrowsAsync<InjectedFailureException>(
            () => ResultSetWriter.WriteAsync(SyntheticRun.With(SyntheticRun.Cells(), epochs), temp.Output, force: true, CancellationToken.None));

        Assert.Equal(["run-out"], temp.Entries());
        Assert.Equal(["keep.txt"], FilesIn(temp.Output));
        Assert.Equal("old", File.ReadAllText(Path.Combine(temp.Output, "keep.txt")));
    }

    [Fact]
    public async Task Cancellation_partway_through_the_write_leaves_no_output_and_no_work_folder()
    {
        using var temp = new TempFolder();
        using var cts = new CancellationTokenSource();
        // Cancel while the first column of cells.parquet is being filled: the next column chunk must not start.
        var cells = new HookedList<CellResult>(SyntheticRun.Cells(), i => { if (i == 2) cts.Cancel(); });

        await Assert.ThrowsAnyAsync<OperationCanceledException>(
            () => ResultSetWriter.WriteAsync(SyntheticRun.With(cells, SyntheticRun.Epochs()), temp.Output, force: false, cts.Token));

        Assert.Empty(temp.Entries());
    }

    [Fact]
    public async Task Cancellation_with_force_keeps_the_old_folder_as_it_was()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);
        byte[] oldSummary = File.ReadAllBytes(Path.Combine(temp.Output, ResultSetLayout.SummaryFileName));
        using var cts = new CancellationTokenSource();
        var epochs = new HookedList<EpochResult>(SyntheticRun.Epochs(), i => { if (i == 1) cts.Cancel(); });
        var changed = SyntheticRun.With(SyntheticRun.Cells(), epochs) with { Metadata = SyntheticRun.Metadata() with { Threads = 7 } };

        await Assert.ThrowsAnyAsync<OperationCanceledException>(
            () => ResultSetWriter.WriteAsync(changed, temp.Output, force: true, cts.Token));

        Assert.Equal(["run-out"], temp.Entries());
        Assert.Equal(oldSummary, File.ReadAllBytes(Path.Combine(temp.Output, ResultSetLayout.SummaryFileName)));
    }

    [Fact]
    public async Task Token_cancelled_before_the_call_writes_nothing()
    {
        using var temp = new TempFolder();

        await Assert.ThrowsAnyAsync<OperationCanceledException>(
            () => ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, new CancellationToken(canceled: true)));

        Assert.Empty(temp.Entries());
    }

    [Fact]
    public void Work_folder_names_are_hidden_siblings_named_after_the_output_folder()
    {
        string output = Path.Combine(Path.GetTempPath(), "runs", "day1");

        string tmp = ResultSetLayout.TemporarySibling(output);
        string aside = ResultSetLayout.AsideSibling(output);

        Assert.Equal(Path.GetDirectoryName(output), Path.GetDirectoryName(tmp));
        Assert.Matches(@"^\.day1\.tmp-[0-9a-f]{12}$", Path.GetFileName(tmp));
        Assert.Matches(@"^\.day1\.old-[0-9a-f]{12}$", Path.GetFileName(aside));
        Assert.True(ResultSetLayout.IsWorkSibling(output, Path.GetFileName(tmp)));
        Assert.NotEqual(tmp, ResultSetLayout.TemporarySibling(output)); // fresh each time
    }

    private static string[] FilesIn(string folder) =>
        Directory.EnumerateFileSystemEntries(folder).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray()!;
}
