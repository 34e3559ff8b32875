namespace SectionTwist.Fuzz;

/// <summary>How one input ended.</summary>
public enum Outcome
{
    /// <summary>A result, every number finite.</summary>
    Ok,
    /// <summary>A one-line <see cref="SectionTwistException"/> (the documented input error).</summary>
    CleanError,
    /// <summary>Stopped cleanly by cancellation at the per-input time budget (slow, but not a hang).</summary>
    Slow,
    /// <summary>Any other exception: a crash a user would see as exit 70.</summary>
    Crash,
    /// <summary>A result holding NaN or infinity.</summary>
    NonFinite,
    /// <summary>Out of memory in the worker, or the worker's memory passed the limit.</summary>
    Memory,
    /// <summary>No answer within the time budget plus the grace period: the worker was ended.</summary>
    Hang,
    /// <summary>The worker process died on the input (stack overflow, fail-fast).</summary>
    Death,
}

/// <summary>Outcome helpers.</summary>
public static class Outcomes
{
    /// <summary>True for the outcomes the campaign must never see.</summary>
    public static bool IsFailure(this Outcome o) => o is Outcome.Crash or Outcome.NonFinite or Outcome.Memory or Outcome.Hang or Outcome.Death;

    /// <summary>Short lower-case name used in files and summaries.</summary>
    public static string Name(this Outcome o) => o switch
    {
        Outcome.Ok => "ok",
        Outcome.CleanError => "clean-error",
        Outcome.Slow => "slow",
        Outcome.Crash => "crash",
        Outcome.NonFinite => "non-finite",
        Outcome.Memory => "memory",
        Outcome.Hang => "hang",
        _ => "death",
    };

    /// <summary>Parses <see cref="Name"/>.</summary>
    public static Outcome Parse(string s) => Enum.GetValues<Outcome>().First(o => o.Name() == s);
}
