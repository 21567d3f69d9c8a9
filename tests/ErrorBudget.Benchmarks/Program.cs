using BenchmarkDotNet.Running;

// Microbenchmarks of the hot loop's parts (issue 6). Run: dotnet run -c Release -- --filter '*'
BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
