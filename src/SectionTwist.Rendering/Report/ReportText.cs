namespace SectionTwist.Rendering.Report;

/// <summary>Default wording of the method, assumptions and caution sections.</summary>
internal static class ReportText
{
    public static readonly IReadOnlyList<string> DefaultMethod =
    [
        "Each cross-section is solved for Saint-Venant torsion with the Prandtl stress function φ: ∇²φ = −2Gθ inside the section, " +
        "φ = 0 on the outer boundary and a constant on each hole chosen so that the warping is single-valued " +
        "(S. P. Timoshenko and J. N. Goodier, Theory of Elasticity, 3rd ed., McGraw-Hill 1970, sections 104–116).",
        "The field equation is solved by the finite-element method with 6-node (quadratic) triangles with curved edges on arcs " +
        "(O. C. Zienkiewicz, R. L. Taylor and J. Z. Zhu, The Finite Element Method: Its Basis and Fundamentals, 7th ed., " +
        "Butterworth-Heinemann 2013). The torsion constant is J = (2/Gθ)∫φ dA (plus the hole terms); the shear stress is the " +
        "rotated gradient of φ, τ = T·|∇φ|/(GθJ), recovered at the nodes (smoothed boundary flux on the outline); the peak is " +
        "the largest recovered value.",
        "The shaft is a chain of segments between stations. Each segment has the torsional stiffness 1/∫dx/(GJ); the station " +
        "rotations follow from the stiffness equations with the fixed supports as constraints, which also covers statically " +
        "indeterminate shafts. From the rotations follow the internal torque T and the twist of each segment; the peak shear of a " +
        "segment is |T| times its section's peak shear per unit torque, τmax = |T|·(τ/T).",
    ];

    public static readonly IReadOnlyList<string> DefaultAssumptions =
    [
        "Linear elastic, isotropic, homogeneous material; small rotations.",
        "Saint-Venant (free-warping) torsion of prismatic bars: warping restraint near supports and load points is not modelled.",
        "Each segment carries the section's stiffness over its full length; the transitions between segments are abrupt.",
        "Stress concentrations at shoulders, keyseat ends, fillets, holes and grooves are not included in the peak shear.",
        "No bending, axial force or dynamic effects (torsional vibration, fatigue) are included.",
    ];

    /// <summary>
    /// The assumptions of a shaft report: the default list, with the free-warping line replaced when the shaft was also
    /// solved with restrained warping and the no-bending, no-dynamics line replaced when the report has those chapters, so
    /// that the list does not deny a chapter the report contains.
    /// </summary>
    public static List<string> ShaftAssumptions(bool restrainedWarping, bool bending, bool dynamics)
    {
        var list = new List<string>(DefaultAssumptions);
        if (restrainedWarping)
            list[1] = "Saint-Venant (free-warping) torsion in the result tables; where the file restrains warping, the segments of open " +
                      "section are also solved in non-uniform (Vlasov) torsion (chapter \"Restrained warping\"), whose rotations and " +
                      "support torques replace the free-warping ones; closed, solid and round segments warp freely.";
        if (bending || dynamics)
            list[4] = (bending
                    ? "Bending and axial force as in the chapter \"Bending with torsion\" (linear elastic beam theory, fatigue as listed there)"
                    : "No bending or axial force")
                + (dynamics ? "; torsional vibration as in the dynamics chapters." : "; no torsional vibration.");
        return list;
    }

    public const string DefaultCaution =
        "Caution: these results are for linear elastic Saint-Venant torsion. Stress concentrations at shoulders, keyseat ends " +
        "and fillets are not included, nor are bending, fatigue or dynamic loads. Verify the design against the applicable " +
        "local codes and standards and have it checked under licensed engineering practice before use.";
}
