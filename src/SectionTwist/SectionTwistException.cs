namespace SectionTwist;

/// <summary>
/// A problem with the user's input (a file, a profile, a spec or an option) that the user can fix.
/// The message is one line that names the place (file, line, entity or key) and the remedy.
/// </summary>
public class SectionTwistException : Exception
{
    /// <summary>Creates an input error.</summary>
    /// <param name="code">A short stable code, e.g. <c>open-loop</c>.</param>
    /// <param name="message">One line naming the place and the remedy.</param>
    public SectionTwistException(string code, string message) : base(message) => Code = code;

    /// <summary>Creates an input error that wraps a lower-level cause.</summary>
    public SectionTwistException(string code, string message, Exception inner) : base(message, inner) => Code = code;

    /// <summary>A short stable code for the kind of problem, e.g. <c>open-loop</c> or <c>self-intersection</c>.</summary>
    public string Code { get; }
}
