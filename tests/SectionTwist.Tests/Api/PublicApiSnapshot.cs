using System.Reflection;
using System.Text;

namespace SectionTwist.Tests.Api;

/// <summary>
/// Writes a canonical listing of an assembly's public surface (types, members with signatures) so that a checked-in
/// baseline catches accidental breaking changes.
/// </summary>
internal static class PublicApiSnapshot
{
    public static string Describe(Assembly asm)
    {
        var sb = new StringBuilder();
        foreach (var t in asm.GetExportedTypes().OrderBy(t => t.FullName, StringComparer.Ordinal))
        {
            sb.Append(Kind(t)).Append(' ').Append(Name(t));
            if (t.BaseType is { } bt && bt != typeof(object) && bt != typeof(ValueType) && bt != typeof(Enum)) sb.Append(" : ").Append(Name(bt));
            foreach (var i in t.GetInterfaces().Where(i => i.IsPublic || i.IsNestedPublic).Select(Name).Order(StringComparer.Ordinal)) sb.Append(", ").Append(i);
            sb.AppendLine();
            const BindingFlags f = BindingFlags.Public | BindingFlags.Instance | BindingFlags.Static | BindingFlags.DeclaredOnly;
            var members = new List<string>();
            foreach (var m in t.GetMembers(f))
            {
                switch (m)
                {
                    case ConstructorInfo c: members.Add($"  ctor({Params(c)})"); break;
                    case MethodInfo mi when !mi.IsSpecialName: members.Add($"  {(mi.IsStatic ? "static " : "")}{Name(mi.ReturnType)} {mi.Name}{Generic(mi)}({Params(mi)})"); break;
                    case PropertyInfo p:
                        members.Add($"  {(p.GetMethod?.IsStatic == true ? "static " : "")}{Name(p.PropertyType)} {p.Name} {{{(p.GetMethod?.IsPublic == true ? " get;" : "")}{(p.SetMethod?.IsPublic == true ? (IsInit(p) ? " init;" : " set;") : "")} }}");
                        break;
                    case FieldInfo fi when !t.IsEnum || !fi.IsSpecialName: members.Add($"  {(fi.IsStatic ? "static " : "")}{(fi.IsLiteral ? "const " : "")}{Name(fi.FieldType)} {fi.Name}"); break;
                    case EventInfo ev: members.Add($"  event {Name(ev.EventHandlerType!)} {ev.Name}"); break;
                }
            }
            foreach (var m in members.Order(StringComparer.Ordinal)) sb.AppendLine(m);
        }
        return sb.ToString().Replace("\r\n", "\n", StringComparison.Ordinal);
    }

    private static bool IsInit(PropertyInfo p) =>
        p.SetMethod!.ReturnParameter.GetRequiredCustomModifiers().Any(m => m.FullName == "System.Runtime.CompilerServices.IsExternalInit");

    private static string Kind(Type t) =>
        t.IsInterface ? "interface" : t.IsEnum ? "enum" : t.IsValueType ? "struct" : t.IsAbstract && t.IsSealed ? "static class" :
        typeof(Delegate).IsAssignableFrom(t) ? "delegate" : t.IsAbstract ? "abstract class" : t.IsSealed ? "sealed class" : "class";

    private static string Generic(MethodInfo m) => m.IsGenericMethodDefinition ? "<" + string.Join(",", m.GetGenericArguments().Select(a => a.Name)) + ">" : "";

    private static string Params(MethodBase m) => string.Join(", ", m.GetParameters().Select(p =>
        $"{(p.IsOut ? "out " : p.ParameterType.IsByRef ? "ref " : "")}{Name(p.ParameterType)} {p.Name}{(p.HasDefaultValue ? " = " + (p.DefaultValue ?? "null") : "")}"));

    private static string Name(Type t)
    {
        if (t.IsByRef) return Name(t.GetElementType()!);
        if (t.IsArray) return Name(t.GetElementType()!) + "[]";
        if (t.IsGenericParameter) return t.Name;
        string n = t.IsNested ? Name(t.DeclaringType!) + "." + t.Name : (t.Namespace is null ? "" : t.Namespace + ".") + t.Name;
        if (t.IsGenericType)
        {
            int tick = n.IndexOf('`', StringComparison.Ordinal);
            if (tick >= 0) n = n[..tick];
            n += "<" + string.Join(",", t.GetGenericArguments().Select(Name)) + ">";
        }
        return n;
    }
}
