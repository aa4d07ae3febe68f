namespace Electrostat.Meshing.Input;

/// <summary>
/// A problem with the mesher's input that the user can fix (duplicate points, crossing segments, a seed on a
/// segment). The message names the place (coordinates in metres) and the fix; it is meant to be shown as is.
/// </summary>
public sealed class MeshInputException : Exception
{
    /// <summary>Creates the exception with a user-facing message.</summary>
    /// <param name="message">What is wrong, where, and how to fix it.</param>
    public MeshInputException(string message) : base(message) { }
}
