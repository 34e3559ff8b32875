using SectionTwist.Torsion;
using SectionTwist.Verification;

namespace SectionTwist.Tests.Torsion;

/// <summary>
/// The reported error estimate must bound the true error on the verification cases (exact solutions of Timoshenko and
/// Goodier ch. 10 and the rectangle series of sec. 109), at the default accuracy and at 1e-6. A floor of 1e-10 allows
/// for the rounding of the reference values themselves.
/// </summary>
public class ErrorEstimateTests
{
    [Theory]
    [InlineData(1e-4)]
    [InlineData(1e-6)]
    public void Estimated_error_bounds_the_true_error_on_the_verification_cases(double accuracy)
    {
        var outcomes = VerificationSuite.Run(new AnalysisOptions { Accuracy = accuracy });
        foreach (var o in outcomes)
        {
            Assert.True(o.Passed, $"{o.Case.Name}: error {o.RelativeError:E2} above tolerance {o.Tolerance:E1} ({o.Case.Source})");
            Assert.True(o.RelativeError <= Math.Max(o.EstimatedRelativeError, 1e-10),
                $"{o.Case.Name} at accuracy {accuracy}: true error {o.RelativeError:E2} exceeds the estimate {o.EstimatedRelativeError:E2}");
            if (o.Case.Quantity == VerifiedQuantity.TorsionConstant)
                Assert.True(o.EstimatedRelativeError <= accuracy, $"{o.Case.Name}: estimate {o.EstimatedRelativeError:E2} above the requested {accuracy:E0}");
        }
    }
}
