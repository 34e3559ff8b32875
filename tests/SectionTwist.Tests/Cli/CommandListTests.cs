using SectionTwist.Cli;
using Xunit;

namespace SectionTwist.Tests.Cli;

/// <summary>The CLI lists its commands by hand (no reflection at start-up): every command class must be in that list.</summary>
public class CommandListTests
{
    [Fact]
    public void Every_command_class_is_listed_once()
    {
        var classes = typeof(ICommand).Assembly.GetTypes()
            .Where(t => typeof(ICommand).IsAssignableFrom(t) && t is { IsAbstract: false, IsInterface: false })
            .Select(t => t.FullName!).Order(StringComparer.Ordinal).ToArray();
        var listed = Program.Commands.Select(c => c.GetType().FullName!).Order(StringComparer.Ordinal).ToArray();
        Assert.Equal(classes, listed);
        Assert.Equal(listed.Length, Program.Commands.Select(c => c.Name).Distinct(StringComparer.Ordinal).Count());
    }
}
