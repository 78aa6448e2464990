using System.Reflection;
using System.Runtime.CompilerServices;

namespace FvGen.Fields;

/// <summary>
/// The components of a conserved-state struct: how many <see cref="double"/>s it holds and their
/// names, nested groups flattened as <c>Outer.Inner</c>. Computed once per type.
/// </summary>
/// <typeparam name="TState">A struct made only of <see cref="double"/> fields, directly or through nested structs.</typeparam>
public static class StateLayout<TState>
    where TState : unmanaged
{
    private static readonly string[] Names = Describe();

    /// <summary>Number of <see cref="double"/> components.</summary>
    public static int ComponentCount => Names.Length;

    /// <summary>Component names in memory order.</summary>
    public static IReadOnlyList<string> ComponentNames => Names;

    /// <summary>
    /// The index of the component called <paramref name="name"/> (ordinal match); a clear error
    /// listing the known names when there is none.
    /// </summary>
    public static int IndexOf(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        int index = Array.IndexOf(Names, name);
        if (index < 0)
        {
            throw new ArgumentException(
                $"{typeof(TState).Name} has no component '{name}'; its components are {string.Join(", ", Names)}.", nameof(name));
        }

        return index;
    }

    private static string[] Describe()
    {
        var names = new List<string>();
        Collect(typeof(TState), prefix: "", names);
        if (names.Count * sizeof(double) != Unsafe.SizeOf<TState>())
        {
            throw new InvalidOperationException(
                $"{typeof(TState).Name} is {Unsafe.SizeOf<TState>()} bytes but holds {names.Count} doubles; a conserved state must be doubles only, with no padding.");
        }

        return names.ToArray();
    }

    private static void Collect(Type type, string prefix, List<string> names)
    {
        if (type == typeof(double))
        {
            names.Add(prefix.Length == 0 ? "Value" : prefix);
            return;
        }

        var fields = type.GetFields(BindingFlags.Instance | BindingFlags.Public | BindingFlags.NonPublic);
        if (fields.Length == 0 || type.IsPrimitive || type.IsEnum)
        {
            throw new InvalidOperationException(
                $"{typeof(TState).Name}: component '{(prefix.Length == 0 ? type.Name : prefix)}' is of type {type.Name}; a conserved state holds only double components.");
        }

        // Reflection returns fields in declaration order for sequential structs, which is memory order.
        foreach (var field in fields)
        {
            string name = field.Name.StartsWith('<') ? field.Name[1..field.Name.IndexOf('>')] : field.Name;
            Collect(field.FieldType, prefix.Length == 0 ? name : prefix + "." + name, names);
        }
    }
}
