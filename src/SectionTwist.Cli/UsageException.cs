namespace SectionTwist.Cli;

/// <summary>A wrong command line; the message names the option and the remedy. Exit code 2.</summary>
internal sealed class UsageException(string message) : Exception(message);
