namespace SectionTwist.Shaft;

/// <summary>
/// Solves a segmented shaft by the stiffness (displacement) method along the axis: one rotation unknown per station,
/// each segment an exact two-node torsion element of stiffness 1 / integral(dx / (G J)) with consistent nodal loads
/// for a uniform distributed torque, springs added between stations, fixed supports removed from the unknowns
/// (Gere and Timoshenko, Mechanics of Materials, statically indeterminate torsion; Przemieniecki, Theory of Matrix
/// Structural Analysis, ch. 5). Statically determinate and indeterminate layouts are solved the same way.
/// </summary>
public static class ShaftSolver
{
    /// <summary>Solves <paramref name="model"/>.</summary>
    /// <param name="model">The shaft.</param>
    /// <param name="cancellationToken">Stops the fully plastic torque integrals of the overload checks (the stiffness solve itself is small).</param>
    /// <exception cref="SectionTwistException">The model is invalid, a loose shaft (no support, unbalanced torques) or a mechanism.</exception>
    public static ShaftResult Solve(ShaftModel model, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(model);
        var result = new ShaftAnalysis(model).Compute();
        result = model.Bending is null ? result : result with { Bending = Bending.ShaftBending.Solve(result) };
        result = WarpingTorsion.ShaftWarping.Attach(result);
        return model.Overload is null ? result : result with { Overload = Plastic.OverloadCheck.Evaluate(result, cancellation: cancellationToken) };
    }
}
