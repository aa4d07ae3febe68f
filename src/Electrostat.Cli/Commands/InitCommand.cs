using Electrostat.Cli.Templates;

namespace Electrostat.Cli.Commands;

/// <summary><c>electrostat init [--template NAME] FILE</c>: writes a commented starter design; never overwrites a file.</summary>
internal sealed class InitCommand : ICommand
{
    public string Name => "init";

    public string Summary => "write a commented starter design to begin from";

    public string Usage => $"""
        usage: electrostat init [--template NAME] FILE.json

        Writes a commented starter design that validates and solves as it is, for you to edit. Refuses to overwrite
        an existing file. Exit code 0 when written, 2 for a bad name or when FILE exists.

        templates:
        {string.Join(Environment.NewLine, StarterTemplates.All.Select(t => $"  {t.Name,-16} {t.Summary}"))}

        options:
          --template NAME    which starter design (default: {StarterTemplates.All[0].Name})

        examples:
          electrostat init my-gap.json
          electrostat init --template sensor pads.json && electrostat solve pads.json
        """;

    public OptionSpec Options { get; } = new(["template"], [], 1, 1);

    public int Run(ParsedArguments args, TextWriter stdout, TextWriter stderr)
    {
        var names = args.Values("template");
        if (names.Count > 1) throw new UsageException("--template given more than once");
        string name = names.Count == 1 ? names[0] : StarterTemplates.All[0].Name;
        string? text = StarterTemplates.Text(name);
        if (text is null)
            throw new UsageException($"unknown template \"{name}\" (known: {string.Join(", ", StarterTemplates.All.Select(t => t.Name))})");
        string path = args.Positionals[0];
        try
        {
            string? dir = Path.GetDirectoryName(Path.GetFullPath(path));
            if (dir is not null) Directory.CreateDirectory(dir);
            // CreateNew fails if the file exists, so an existing design is never replaced, even in a race.
            using var stream = new FileStream(path, FileMode.CreateNew, FileAccess.Write);
            using var writer = new StreamWriter(stream, new System.Text.UTF8Encoding(false));
            writer.Write(text);
        }
        catch (IOException) when (File.Exists(path) || Directory.Exists(path))
        {
            stderr.WriteLine($"electrostat init: \"{path}\" already exists; it was left unchanged. Choose another file name or delete it first.");
            return ExitCodes.InputError;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
        {
            stderr.WriteLine($"electrostat init: cannot write \"{path}\": {e.Message}");
            return ExitCodes.InputError;
        }
        stdout.WriteLine($"wrote {path} (template {name}); next: electrostat check {path}, then electrostat solve {path}");
        return ExitCodes.Ok;
    }
}
