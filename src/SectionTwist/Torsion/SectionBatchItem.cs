namespace SectionTwist.Torsion;

/// <summary>One section of a batch: its result, or the input error that stopped it.</summary>
/// <param name="Index">Position in the input list.</param>
/// <param name="Source">The source as given (template spec or path), or the profile's name.</param>
/// <param name="Result">The result; null when <paramref name="Error"/> is set.</param>
/// <param name="Error">The input error (one line with the remedy); null on success.</param>
public sealed record SectionBatchItem(int Index, string Source, SectionResult? Result, SectionTwistException? Error);
