namespace ErrorBudget.Core.Integrity.Araim;

/// <summary>One out-of-range ARAIM parameter, worded one way: name, value and the allowed range.</summary>
/// <param name="Name">Property name of <see cref="AraimParameters"/>, e.g. <c>PhmiVertical</c>.</param>
/// <param name="Value">The rejected value.</param>
/// <param name="Allowed">The accepted range, e.g. <c>0 &lt; PhmiVertical &lt; 1</c>.</param>
internal sealed record AraimParameterError(string Name, double Value, string Allowed)
{
    /// <summary>One sentence: <c>PhmiVertical = 0 is out of range; allowed: 0 &lt; PhmiVertical &lt; 1</c>.</summary>
    public string Message =>
        string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{Name} = {Value:R} is out of range; allowed: {Allowed}");
}
