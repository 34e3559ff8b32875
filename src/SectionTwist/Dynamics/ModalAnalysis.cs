namespace SectionTwist.Dynamics;

/// <summary>
/// Torsional natural frequencies and modes of a drivetrain: lumped inertias at stations, the shafts' own inertia
/// distributed along their segments (consistent inertia matrices of linear elements), springs, rigid or elastic gear and belt
/// stages. Solves K v = omega^2 M v by Cholesky reduction to a standard symmetric eigenproblem
/// (<see cref="SymmetricDefiniteEigen"/>). The number of elements per segment is chosen so that every listed frequency
/// meets <see cref="ModalOptions.Tolerance"/> (see <see cref="ModalOperation"/>).
/// </summary>
/// <remarks>Linear and undamped; gear backlash and the motor's electromechanical coupling are not modelled.</remarks>
public static class ModalAnalysis
{
    /// <summary>Computes the lowest modes of <paramref name="model"/>.</summary>
    /// <param name="model">The drivetrain.</param>
    /// <param name="options">Mode count and tolerance; null for the defaults.</param>
    /// <param name="cancellationToken">Observed between refinement passes and inside the reduction and eigen solve (every row).</param>
    public static ModalResult Solve(DrivetrainModel model, ModalOptions? options = null, CancellationToken cancellationToken = default) =>
        new ModalOperation(model, options ?? new ModalOptions(), cancellationToken).Compute();
}
