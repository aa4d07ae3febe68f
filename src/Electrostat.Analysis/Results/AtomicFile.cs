using System.Text;

namespace Electrostat.Analysis.Results;

/// <summary>Writes a file atomically: the text goes to a temporary file in the same folder, which is then renamed
/// over the target, so a reader never sees a half-written file and a failure leaves the old file in place.</summary>
public static class AtomicFile
{
    /// <summary>Writes <paramref name="text"/> (UTF-8, no byte-order mark) to <paramref name="path"/> atomically.</summary>
    /// <param name="path">Target path.</param>
    /// <param name="text">Content.</param>
    public static void WriteAllText(string path, string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        WriteAllBytes(path, new UTF8Encoding(false).GetBytes(text));
    }

    /// <summary>Writes <paramref name="bytes"/> to <paramref name="path"/> atomically.</summary>
    /// <param name="path">Target path.</param>
    /// <param name="bytes">Content.</param>
    public static void WriteAllBytes(string path, byte[] bytes)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(bytes);
        string full = Path.GetFullPath(path);
        string dir = Path.GetDirectoryName(full) ?? ".";
        string temp = Path.Combine(dir, "." + Path.GetFileName(full) + "." + Guid.NewGuid().ToString("N")[..8] + ".tmp");
        try
        {
            File.WriteAllBytes(temp, bytes);
            File.Move(temp, full, overwrite: true);
        }
        finally
        {
            if (File.Exists(temp)) File.Delete(temp);
        }
    }
}
