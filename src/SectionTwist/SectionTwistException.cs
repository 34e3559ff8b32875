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
    public SectionTwistException(string code, string message) : base(Tidy(message)) => Code = code;

    /// <summary>Creates an input error that wraps a lower-level cause.</summary>
    public SectionTwistException(string code, string message, Exception inner) : base(Tidy(message), inner) => Code = code;

    /// <summary>Longest message kept whole; longer ones (an echoed value from a hostile file) keep their start and their remedy at the end.</summary>
    public const int MaxMessageLength = 1000;

    /// <summary>One line of at most <see cref="MaxMessageLength"/> characters: line breaks become spaces, an over-long middle is cut.</summary>
    private static string Tidy(string message)
    {
        ArgumentNullException.ThrowIfNull(message);
        if (message.AsSpan().IndexOfAny('\n', '\r') >= 0) message = message.Replace("\r\n", " ", StringComparison.Ordinal).Replace('\n', ' ').Replace('\r', ' ');
        return message.Length <= MaxMessageLength ? message : string.Concat(message.AsSpan(0, 600), " [...] ", message.AsSpan(message.Length - 300));
    }

    /// <summary>A short stable code for the kind of problem, e.g. <c>open-loop</c> or <c>self-intersection</c>.</summary>
    public string Code { get; }
}
