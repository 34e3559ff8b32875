using System.Text;
using SectionTwist.Limits;
using YamlDotNet.Core;
using YamlDotNet.Core.Events;

namespace SectionTwist.Shaft;

/// <summary>
/// Checks shaft-file text with the YAML event parser before the representation model is built, so that no YAML input
/// can overflow the stack, expand without bound or escape as a library exception: characters outside YAML's printable
/// set, values longer than <see cref="InputLimits.MaxYamlValueLength"/>, nesting deeper than
/// <see cref="InputLimits.MaxYamlDepth"/>, more than <see cref="InputLimits.MaxYamlNodes"/> nodes (an alias counts
/// with the size of the node it refers to, so "billion laughs" stops early), keys that are not plain names, repeated keys
/// and aliases of a node from inside that node are refused with file, line and column.
/// </summary>
internal static class YamlGuard
{
    private sealed class Frame(bool mapping)
    {
        public bool Mapping { get; } = mapping;
        public bool ExpectKey = mapping;
        public HashSet<string>? Keys;
    }

    public static void Check(string text, string file)
    {
        CheckCharacters(text, file);
        var frames = new Stack<Frame>();
        // open anchored nodes: name -> node count at their start
        var open = new Dictionary<string, long>(StringComparer.Ordinal);
        var openStack = new Stack<(string Name, long Start, int Depth)>();
        var sizes = new Dictionary<string, long>(StringComparer.Ordinal);
        long nodes = 0;
        Mark last = Mark.Empty;
        var parser = new Parser(new StringReader(text));
        try
        {
            while (parser.MoveNext())
            {
                var ev = parser.Current!;
                last = ev.Start;
                switch (ev)
                {
                    case Scalar s:
                        if (s.Value.Length > InputLimits.MaxYamlValueLength)
                            throw Error(file, ev.Start, $"a value of {s.Value.Length} characters (at most {InputLimits.MaxYamlValueLength}); shorten it");
                        KeyOrValue(frames, file, ev, s.Value);
                        nodes++;
                        if (!s.Anchor.IsEmpty) sizes[s.Anchor.Value] = 1;
                        break;
                    case AnchorAlias a:
                        {
                            KeyOrValue(frames, file, ev, null);
                            string name = a.Value.Value;
                            if (open.ContainsKey(name))
                                throw Error(file, ev.Start, $"the alias *{name} is used inside the node &{name} it refers to (a node cannot contain itself); write the values out");
                            if (!sizes.TryGetValue(name, out long size))
                                throw Error(file, ev.Start, $"the alias *{name} refers to no anchor &{name} before it; define the anchor first or write the value out");
                            nodes += size;
                            break;
                        }
                    case MappingStart or SequenceStart:
                        {
                            KeyOrValue(frames, file, ev, null);
                            nodes++;
                            var anchor = ((NodeEvent)ev).Anchor;
                            frames.Push(new Frame(ev is MappingStart));
                            if (frames.Count > InputLimits.MaxYamlDepth)
                                throw Error(file, ev.Start, $"lists and mappings nest deeper than {InputLimits.MaxYamlDepth} levels; a shaft file needs at most 4");
                            StartAnchor(anchor, nodes - 1, frames.Count, open, openStack);
                            break;
                        }
                    case MappingEnd or SequenceEnd:
                        frames.Pop();
                        EndAnchor(frames.Count + 1, nodes, open, openStack, sizes);
                        if (frames.Count > 0 && frames.Peek().Mapping) frames.Peek().ExpectKey = true;
                        break;
                }
                if (nodes > InputLimits.MaxYamlNodes)
                    throw Error(file, ev.Start, $"the file expands to more than {InputLimits.MaxYamlNodes} values (aliases count with what they refer to); a shaft file needs far fewer - write repeated parts out or split the file");
            }
        }
        catch (YamlException e)
        {
            // the scanner places a tab in the indentation at the start of the enclosing block (often 1:1): name the tab's own line
            if ((e.InnerException?.Message ?? e.Message).Contains("tab", StringComparison.OrdinalIgnoreCase) && ShaftFileReader.TabIndentation(text) is { } tab)
                throw new SectionTwistException("shaft-file", $"{file}:{tab.Line}:{tab.Column}: a tab in the indentation; YAML indents with spaces only: replace the tab with spaces");
            var at = e.Start.Line > 0 ? e.Start : last;
            throw new SectionTwistException("shaft-file", $"{file}:{Math.Max(1, at.Line)}:{Math.Max(1, at.Column)}: not valid YAML: {FirstLine(e.InnerException?.Message ?? e.Message)}; check the indentation and quoting there");
        }
        catch (Exception e) when (e is not SectionTwistException and not OutOfMemoryException)
        {
            throw new SectionTwistException("shaft-file", $"{file}:{Math.Max(1, last.Line)}:{Math.Max(1, last.Column)}: not valid YAML after this point ({FirstLine(e.Message)}); check for an unclosed '{{' or '[', a stray quote or a malformed tag");
        }
    }

    private static void KeyOrValue(Stack<Frame> frames, string file, ParsingEvent ev, string? scalar)
    {
        if (frames.Count == 0 || !frames.Peek().Mapping) return;
        var f = frames.Peek();
        if (!f.ExpectKey) { f.ExpectKey = ev is Scalar or AnchorAlias; return; }
        if (scalar is null)
            throw Error(file, ev.Start, ev is AnchorAlias
                ? "an alias is used as a key; keys are plain names such as 'name' or 'at'"
                : "a list or mapping is used as a key; keys are plain names such as 'name' or 'at' (remove the '?' or the braces)");
        f.Keys ??= new HashSet<string>(StringComparer.Ordinal);
        if (!f.Keys.Add(scalar))
            throw Error(file, ev.Start, $"the key '{Short(scalar)}' appears twice in the same mapping; keep one");
        f.ExpectKey = false;
    }

    private static void StartAnchor(AnchorName anchor, long start, int depth, Dictionary<string, long> open, Stack<(string, long, int)> stack)
    {
        if (anchor.IsEmpty) return;
        open[anchor.Value] = start;
        stack.Push((anchor.Value, start, depth));
    }

    private static void EndAnchor(int depth, long nodes, Dictionary<string, long> open, Stack<(string Name, long Start, int Depth)> stack, Dictionary<string, long> sizes)
    {
        while (stack.Count > 0 && stack.Peek().Depth == depth)
        {
            var (name, start, _) = stack.Pop();
            open.Remove(name);
            sizes[name] = Math.Max(1, nodes - start);
        }
    }

    /// <summary>Refuses characters YAML does not allow in a stream (YAML 1.2, sec. 5.1, c-printable), e.g. NUL.</summary>
    private static void CheckCharacters(string text, string file)
    {
        int line = 1, col = 1;
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            bool ok = c is '\t' or '\n' or '\r' or '\u0085' || (c >= 0x20 && c <= 0x7E) || (c >= 0xA0 && c <= 0xD7FF) || (c >= 0xE000 && c <= 0xFFFD);
            if (!ok && char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1])) { i++; col++; continue; }
            if (!ok)
                throw new SectionTwistException("shaft-file",
                    $"{file}:{line}:{col}: the control character U+{(int)c:X4} is not allowed in a shaft file; it is plain text - remove the character (was the file saved as text?)");
            if (c == '\n') { line++; col = 1; } else col++;
        }
    }

    private static SectionTwistException Error(string file, Mark at, string message) =>
        new("shaft-file", $"{file}:{at.Line}:{at.Column}: {message}");

    private static string FirstLine(string s) => Short(s.Split('\n')[0].Trim().TrimEnd('.'), 160);

    internal static string Short(string s, int max = 40)
    {
        if (s.Length <= max) return s;
        var b = new StringBuilder(s, 0, max, max + 30);
        b.Append($"... ({s.Length} characters)");
        return b.ToString();
    }
}
