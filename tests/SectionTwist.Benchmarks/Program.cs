using System.Globalization;
using BenchmarkDotNet.Running;

namespace SectionTwist.Benchmarks;

/// <summary>
/// BenchmarkDotNet entry (<c>dotnet run -c Release -- --filter *SolverBenchmarks*</c>), or <c>quick [m]</c> for a
/// single pass with the Math.NET baseline and the ratio, or <c>sheet [entities]</c> for the drawing-sheet timing (<see cref="SheetRun"/>).
/// </summary>
public static class Program
{
    public static void Main(string[] args)
    {
        if (args.Length > 0 && args[0] == "modes")
        {
            ModalBenchmarks.Quick();
            return;
        }
        if (args.Length > 0 && args[0] == "quick")
        {
            QuickRun.Run(args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 158, args.Length > 2 && args[2] == "stock");
            return;
        }
        if (args.Length > 0 && args[0] == "sheet")
        {
            SheetRun.Run(args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 50_000);
            return;
        }
        BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
    }
}
