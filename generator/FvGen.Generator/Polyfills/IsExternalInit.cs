// Lets netstandard2.0 code use records and init-only setters.
namespace System.Runtime.CompilerServices;

internal static class IsExternalInit
{
}
