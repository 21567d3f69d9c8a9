using System.Globalization;
using System.Text.RegularExpressions;

namespace ErrorBudget.Core.Scenarios;

/// <summary>Strict RFC 3339 date-time with a UTC offset (section 5.6), e.g. 2031-06-01T00:00:00Z.</summary>
internal static partial class Rfc3339
{
    public static bool TryParse(string text, out DateTimeOffset utc)
    {
        utc = default;
        if (!Shape().IsMatch(text))
        {
            return false;
        }

        if (!DateTimeOffset.TryParse(text, CultureInfo.InvariantCulture, DateTimeStyles.None, out var parsed))
        {
            return false;
        }

        utc = parsed.ToUniversalTime();
        return true;
    }

    [GeneratedRegex(@"^\d{4}-\d{2}-\d{2}[Tt ]\d{2}:\d{2}:\d{2}(\.\d+)?([Zz]|[+-]\d{2}:\d{2})$", RegexOptions.CultureInvariant)]
    private static partial Regex Shape();
}
