using ErrorBudget.Results.Schema;
using ErrorBudget.Results.Tests.TestData;

namespace ErrorBudget.Results.Tests.Schema;

/// <summary>
/// The checked-in results-schema/ documents equal what the column definitions generate. To update
/// them after a deliberate change: ERRORBUDGET_REGENERATE_SCHEMAS=1 dotnet test --filter SchemaDocumentsAreCurrent
/// (rewrites the repository folder), then review the diff and commit.
/// </summary>
public class SchemaDocumentsAreCurrentTests
{
    public static TheoryData<string> DocumentNames() => [.. SchemaDocuments.All().Select(d => d.FileName)];

    [Theory]
    [MemberData(nameof(DocumentNames))]
    public void Checked_in_schema_document_equals_the_one_generated_from_the_definitions(string fileName)
    {
        string generated = SchemaDocuments.All().Single(d => d.FileName == fileName).Text;
        bool regenerate = Environment.GetEnvironmentVariable(SchemaFiles.RegenerateVariable) == "1";
        if (regenerate)
        {
            string folder = SchemaFiles.RepositoryFolder();
            Directory.CreateDirectory(folder);
            File.WriteAllText(Path.Combine(folder, fileName), generated);
        }

        string checkedIn = File.ReadAllText(Path.Combine(SchemaFiles.RepositoryFolder(), fileName));
        Assert.Equal(generated, checkedIn.ReplaceLineEndings("\n"));
        if (!regenerate)
        {
            // The copy the other tests read is the checked-in file (it is stale only until the next build after regenerating).
            Assert.Equal(checkedIn, File.ReadAllText(Path.Combine(SchemaFiles.CopiedFolder, fileName)));
        }
    }

    [Fact]
    public void Results_schema_folder_holds_exactly_the_generated_documents()
    {
        var present = Directory.EnumerateFiles(SchemaFiles.RepositoryFolder(), "*.json").Select(Path.GetFileName).Order(StringComparer.Ordinal);
        var generated = SchemaDocuments.All().Select(d => d.FileName).Order(StringComparer.Ordinal);

        Assert.Equal(generated, present);
    }
}
