namespace Electrostat.Cli.Tests;

/// <summary>Runs the command in-process and captures its output.</summary>
internal static class CliRun
{
    public static (int Exit, string Out, string Err) Run(params string[] args)
    {
        var o = new StringWriter();
        var e = new StringWriter();
        int code = CommandRunner.Run(args, o, e);
        return (code, o.ToString(), e.ToString());
    }
}
