using Electrostat.Geometry.Loading;

namespace Electrostat.Geometry.Tests.Loading;

public class SuggestionsTests
{
    [Theory]
    [InlineData("kitten", "sitting", 3)] // the textbook Levenshtein example (Wagner & Fischer 1974)
    [InlineData("oli", "oil", 1)] // swapped neighbours cost 1 (Damerau 1964)
    [InlineData("Potential", "potential", 0)] // case-insensitive
    [InlineData("", "abc", 3)]
    public void EditDistance_MatchesPublishedExamples(string a, string b, int expected)
    {
        Assert.Equal(expected, Suggestions.EditDistance(a, b));
        Assert.Equal(expected, Suggestions.EditDistance(b, a));
    }

    [Fact]
    public void Hint_SuggestsNearestOrListsChoices()
    {
        Assert.Equal("did you mean 'circle'?", Suggestions.Hint("circel", ["rectangle", "circle", "polygon", "path"]));
        Assert.Equal("expected one of: 'planar', 'axisymmetric'", Suggestions.Hint("round", ["planar", "axisymmetric"]));
    }
}
