using System.Globalization;
using BenchmarkDotNet.Running;

namespace SectionTwist.Benchmarks;

/// <summary>
/// BenchmarkDotNet entry (<c>dotnet run -c Release -- --filter *SolverBenchmarks*</c>), or <c>quick [m]</c> for a
/// single pass with the Math.NET baseline and the ratio, <c>sheet [entities]</c> for the drawing-sheet timing
/// (<see cref="SheetRun"/>), <c>orders [h] [specs]</c> for observed convergence orders (<see cref="Orders"/>),
/// <c>estimates [accuracies] [reference] [name filter]</c> for the error estimates against the true errors
/// (<see cref="EstimateSweep"/>), <c>answer [runs]</c> for the time to an accurate answer, former against current
/// settings (<see cref="AnswerRun"/>), <c>warping [accuracy] [repeats]</c> for the cost of the warping solve
/// (<see cref="WarpingRun"/>), <c>warping-stages [accuracy] [repeats] [specs]</c> for its stages
/// (<see cref="WarpingStages"/>), <c>native [m] [runs] [driver]</c> for our sparse Cholesky against CHOLMOD side by side
/// (<see cref="NativeRun"/>).
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
        if (args.Length > 0 && args[0] == "answer")
        {
            AnswerRun.Run(args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 5);
            return;
        }
        if (args.Length > 0 && args[0] == "warping")
        {
            WarpingRun.Run(args.Length > 1 ? double.Parse(args[1], CultureInfo.InvariantCulture) : 1e-4, args.Length > 2 ? int.Parse(args[2], CultureInfo.InvariantCulture) : 3);
            return;
        }
        if (args.Length > 0 && args[0] == "warping-stages")
        {
            WarpingStages.Run(args.Length > 1 ? double.Parse(args[1], CultureInfo.InvariantCulture) : 1e-4,
                args.Length > 2 ? int.Parse(args[2], CultureInfo.InvariantCulture) : 20, args.Length > 3 ? args[3..] : []);
            return;
        }
        if (args.Length > 0 && args[0] == "quick")
        {
            QuickRun.Run(args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 158, args.Length > 2 && args[2] == "stock");
            return;
        }
        if (args.Length > 0 && args[0] == "native")
        {
            NativeRun.Run(args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 158,
                args.Length > 2 ? int.Parse(args[2], CultureInfo.InvariantCulture) : 3, args.Length > 3 ? args[3] : null);
            return;
        }
        if (args.Length > 0 && args[0] == "sheet")
        {
            SheetRun.Run(args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 50_000);
            return;
        }
        if (args.Length > 0 && args[0] == "estimates")
        {
            double[] acc = args.Length > 1 ? args[1].Split(',').Select(v => double.Parse(v, CultureInfo.InvariantCulture)).ToArray() : [1e-3, 1e-4, 1e-5];
            double reference = args.Length > 2 ? double.Parse(args[2], CultureInfo.InvariantCulture) : 1e-7;
            Environment.Exit(EstimateSweep.Run(acc, reference, args.Length > 3 ? args[3] : null) == 0 ? 0 : 1);
        }
        if (args.Length > 0 && args[0] == "orders")
        {
            Orders.Run(args.Length > 1 ? double.Parse(args[1], CultureInfo.InvariantCulture) : 0.15, args.Length > 2 ? args[2..] : null);
            return;
        }
        BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
    }
}
