using System.Net;
using System.Text;

namespace Electrostat.Rendering.Report;

/// <summary>A small HTML builder: raw markup, escaped text and the report's section frame.</summary>
internal sealed class Html
{
    private readonly StringBuilder _sb = new();

    public Html Raw(string markup)
    {
        _sb.Append(markup);
        return this;
    }

    public Html Text(string text)
    {
        _sb.Append(WebUtility.HtmlEncode(text));
        return this;
    }

    public void Section(int number, string id, string title)
    {
        _sb.Append("<section id=\"").Append(id).Append("\"><h2><span class=\"no\">").Append(number).Append(".</span>");
        Text(title);
        _sb.Append("</h2>\n");
    }

    public void EndSection() => _sb.Append("</section>\n");

    public void Row(string key, string value)
    {
        _sb.Append("<tr><th>");
        Text(key);
        _sb.Append("</th><td>");
        Text(value);
        _sb.Append("</td></tr>");
    }

    public override string ToString() => _sb.ToString();
}
