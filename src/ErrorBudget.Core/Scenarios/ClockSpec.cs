namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// [clock]: the satellite clock truth model (simple form): at each upload the broadcast clock is
/// reset with an estimation error (offset) and a rate error; between uploads the error grows
/// linearly with the age of data: e(age) = offset + rate * age, so
/// sigma(age)^2 = UploadSigma^2 + (RateSigma * age)^2.
/// </summary>
/// <param name="UploadSigmaMeters">Range error just after an upload (1 sigma). Range: [0, 1000] m.</param>
/// <param name="GrowthSigmaMetersPerSecond">Rate error (1 sigma), in metres of range per second. Range: [0, 1] m/s.</param>
/// <param name="UploadIntervalSeconds">Range: [60 s, 30 days].</param>
public sealed record ClockSpec(
    double UploadSigmaMeters,
    double GrowthSigmaMetersPerSecond,
    double UploadIntervalSeconds);
