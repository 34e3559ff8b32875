namespace SectionTwist.Cli;

/// <summary>A sub-command of <c>sectiontwist</c>. Implementations are found by reflection, one class per file.</summary>
internal interface ICommand
{
    /// <summary>The word typed after <c>sectiontwist</c>.</summary>
    string Name { get; }

    /// <summary>One line for the command list.</summary>
    string Summary { get; }

    /// <summary>Usage text shown by <c>sectiontwist help NAME</c> and on a usage error.</summary>
    string Usage { get; }

    /// <summary>Runs the command; returns the process exit code.</summary>
    int Run(Args args, CliContext context);
}
