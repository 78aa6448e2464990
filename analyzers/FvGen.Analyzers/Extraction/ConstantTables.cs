using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using FvGen.Analyzers.Conservation;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Analyzers.Extraction;

/// <summary>
/// Local arrays of numeric constants that nothing changes (<c>double[] sideSign = { -1.0, 1.0 };</c>):
/// an element read at a constant subscript is that number, not an opaque symbol, so a sign taken
/// from such a table (<c>sideSign[faceLeft[f] == c ? 0 : 1]</c> in a gather) is exact. A table is
/// accepted only when every other use of the local in the method reads one of its elements.
/// </summary>
internal static class ConstantTables
{
    public static IEnumerable<(string Name, ImmutableArray<Rational> Values)> Find(IOperation body, OperationIndex operations)
    {
        foreach (var declarator in operations.Descendants(body).OfType<IVariableDeclaratorOperation>())
        {
            if (declarator.Symbol.Type is not IArrayTypeSymbol { Rank: 1 } || declarator.GetVariableInitializer()?.Value is not { } value)
            {
                continue;
            }

            while (value is IConversionOperation conversion)
            {
                value = conversion.Operand;
            }

            if (value is not IArrayCreationOperation { Initializer: { } initializer } || initializer.ElementValues.Any(e => !e.ConstantValue.HasValue))
            {
                continue;
            }

            var values = new List<Rational>();
            foreach (var element in initializer.ElementValues)
            {
                double number = Convert.ToDouble(element.ConstantValue.Value, System.Globalization.CultureInfo.InvariantCulture);
                if (!Rational.TryFromDouble(number, out var rational))
                {
                    break;
                }

                values.Add(rational);
            }

            if (values.Count == initializer.ElementValues.Length && OnlyElementReads(body, declarator.Symbol, operations) && NameIsUnique(body, declarator.Symbol, operations))
            {
                yield return (declarator.Symbol.Name, values.ToImmutableArray());
            }
        }
    }

    /// <summary>Arrays are known by name: no other local, parameter or member of the method may share it.</summary>
    private static bool NameIsUnique(IOperation body, ILocalSymbol table, OperationIndex operations) =>
        operations.Descendants(body).All(op => op switch
        {
            IVariableDeclaratorOperation d => SymbolEqualityComparer.Default.Equals(d.Symbol, table) || d.Symbol.Name != table.Name,
            ILocalReferenceOperation l => SymbolEqualityComparer.Default.Equals(l.Local, table) || l.Local.Name != table.Name,
            IParameterReferenceOperation p => p.Parameter.Name != table.Name,
            IFieldReferenceOperation f => f.Field.Name != table.Name,
            IPropertyReferenceOperation p => p.Property.Name != table.Name,
            _ => true,
        });

    private static bool OnlyElementReads(IOperation body, ILocalSymbol table, OperationIndex operations) =>
        operations.Descendants(body).OfType<ILocalReferenceOperation>()
            .Where(l => SymbolEqualityComparer.Default.Equals(l.Local, table))
            .All(l => l.Parent is IArrayElementReferenceOperation element && ReferenceEquals(element.ArrayReference, l)
                && !(element.Parent is IAssignmentOperation a && ReferenceEquals(a.Target, element))
                && element.Parent is not (IIncrementOrDecrementOperation or IArgumentOperation { Parameter.RefKind: not RefKind.None and not RefKind.In })
                && element.Parent is not (IVariableInitializerOperation { Parent: IVariableDeclaratorOperation { Symbol.IsRef: true } } or ISimpleAssignmentOperation { IsRef: true }));
}
