using System.Globalization;
using System.Text.Json;
using Electrostat.Analysis.Pipeline;
using Electrostat.Analysis.Results;
using Electrostat.Rendering.Report;
using Electrostat.Rendering.Tests.Support;
using OpenQA.Selenium;
using OpenQA.Selenium.Chrome;
using OpenQA.Selenium.Interactions;
using Xunit.Abstractions;

namespace Electrostat.Rendering.Tests.Report;

/// <summary>Opens report.html in headless Chromium (the system package) and checks it as a user would see it.</summary>
public class BrowserReportTests(ITestOutputHelper output)
{
    private const string ChromeDriver = "/usr/bin/chromedriver", Chromium = "/usr/bin/chromium";

    [Fact]
    public void Report_LoadsWithoutErrors_ShowsTheTables_AndTheReadoutFollowsThePointer()
    {
        bool haveBrowser = File.Exists(ChromeDriver) && File.Exists(Chromium);
        if (!haveBrowser)
        {
            // In CI a missing browser is a failure; elsewhere, too: chromium is installable with apt-get.
            Assert.Fail($"Chromium or chromedriver missing ({Chromium}, {ChromeDriver}); install with: apt-get install -y chromium chromium-driver");
        }

        var design = Designs.Load(Designs.Coax);
        var outcome = SolvePipeline.Run(design, AccuracyLevel.Coarse);
        var input = ReportInput.FromOutcome(outcome);
        string folder = Path.Combine(AppContext.BaseDirectory, "artifacts", "browser-report");
        if (Directory.Exists(folder)) Directory.Delete(folder, recursive: true);
        var files = ReportWriter.Write(folder, input);
        // results.json from the solve pipeline's own writer: the page must show the same numbers.
        string resultsPath = Path.Combine(folder, "results.json");
        File.WriteAllText(resultsPath, ResultsJsonWriter.Write(outcome, "coax.json"));
        using var results = JsonDocument.Parse(File.ReadAllText(resultsPath));
        Assert.True(files.Insets.Count > 0);
        Assert.NotEmpty(files.SurfacePlots);

        var options = new ChromeOptions { BinaryLocation = Chromium };
        string profile = Path.Combine(Path.GetTempPath(), "electrostat-chromium-" + Guid.NewGuid().ToString("N"));
        options.AddArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update",
            "--disable-sync", "--no-first-run", "--window-size=1280,1000", "--user-data-dir=" + profile);
        options.SetLoggingPreference(LogType.Browser, LogLevel.All);
        var service = ChromeDriverService.CreateDefaultService(Path.GetDirectoryName(ChromeDriver)!, Path.GetFileName(ChromeDriver));
        service.SuppressInitialDiagnosticInformation = true;
        try
        {
            using var driver = new ChromeDriver(service, options, TimeSpan.FromSeconds(120));
            driver.Navigate().GoToUrl(new Uri(files.ReportHtml).AbsoluteUri);
            var js = (IJavaScriptExecutor)driver;

            // Every image decoded.
            var widths = (IReadOnlyCollection<object>)js.ExecuteScript("return Array.from(document.images).map(i => i.complete ? i.naturalWidth : 0);")!;
            Assert.True(widths.Count >= 3, $"expected the map, insets and plots, found {widths.Count} images");
            Assert.All(widths, w => Assert.True(Convert.ToInt64(w, CultureInfo.InvariantCulture) > 0));

            // No network: the page holds no http(s) references.
            Assert.DoesNotContain("http://", File.ReadAllText(files.ReportHtml).Replace("http://www.w3.org/", "", StringComparison.Ordinal), StringComparison.Ordinal);
            Assert.DoesNotContain("https://", File.ReadAllText(files.ReportHtml), StringComparison.Ordinal);

            // Tables carry the values of results.json: the Maxwell matrix and the margins.
            var maxwell = results.RootElement.GetProperty("capacitance").GetProperty("maxwell");
            int n = maxwell.GetArrayLength();
            var capCells = driver.FindElements(By.CssSelector("#capacitance-table td[data-si]"));
            Assert.Equal(n * n, capCells.Count);
            for (int i = 0; i < n; i++)
                for (int j = 0; j < n; j++)
                    AssertSame(maxwell[i][j].GetDouble(), capCells.ElementAt(i * n + j).GetAttribute("data-si")!);
            // Coax capacitance per metre 2πε/ln(b/a) (Griffiths, Introduction to Electrodynamics, §2.5, problem 2.43 form)
            // with εr = 2: the shown value agrees within 1 %.
            double exactPf = 2 * Math.PI * 2 * 8.8541878128e-12 / Math.Log(Designs.CoaxB / Designs.CoaxA) * 1e12;
            double shownPf = double.Parse(capCells.First().Text, CultureInfo.InvariantCulture);
            Assert.InRange(shownPf, exactPf * 0.99, exactPf * 1.01);
            var margins = results.RootElement.GetProperty("margins").EnumerateArray().ToList();
            var marginRows = driver.FindElements(By.CssSelector("#margin-table tbody tr"));
            Assert.Equal(margins.Count, marginRows.Count);
            foreach (var (m, row) in margins.Zip(marginRows))
            {
                var cells = row.FindElements(By.TagName("td"));
                Assert.Equal(m.GetProperty("material").GetString(), cells[0].Text);
                AssertSame(m.GetProperty("peak_field_V_per_m").GetDouble(), cells[2].GetAttribute("data-si")!);
                AssertSame(m.GetProperty("margin").GetDouble(), cells[4].GetAttribute("data-si")!);
                // The printed text is the same number rounded for reading (kV/mm, 4 significant digits).
                Assert.Equal(m.GetProperty("peak_field_V_per_m").GetDouble() * 1e-6, double.Parse(cells[2].Text, CultureInfo.InvariantCulture), 4e-4 * m.GetProperty("peak_field_V_per_m").GetDouble() * 1e-6);
            }
            Assert.Contains("qualified person", driver.FindElement(By.Id("caution-banner")).Text, StringComparison.Ordinal);

            // Pointer over the map at r = 5 mm on the x axis: the readout shows φ = V ln(b/r)/ln(b/a) within 1 %
            // (Griffiths §2.3), evaluated at the design point the page reports for the pointer.
            var img = driver.FindElement(By.Id("field-map"));
            var frame = ReportFigures.Render(input, new ReportOptions()).Map.Frame;
            double natural = Convert.ToDouble(js.ExecuteScript("return arguments[0].naturalWidth;", img), CultureInfo.InvariantCulture);
            double cssScale = img.Size.Width / natural;
            double px = frame.PixelX(5e-3) * cssScale, py = frame.PixelY(0.4e-3) * cssScale;
            new Actions(driver).MoveToElement(img, (int)Math.Round(px - img.Size.Width / 2.0), (int)Math.Round(py - img.Size.Height / 2.0)).Perform();
            var readout = driver.FindElement(By.Id("readout"));
            string phiText = readout.GetAttribute("data-potential-volts")!;
            output.WriteLine("readout: " + readout.Text);
            Assert.False(string.IsNullOrEmpty(phiText), "the readout did not update: " + readout.Text);
            double x = double.Parse(readout.GetAttribute("data-x-metres")!, CultureInfo.InvariantCulture);
            double y = double.Parse(readout.GetAttribute("data-y-metres")!, CultureInfo.InvariantCulture);
            double r = Math.Sqrt(x * x + y * y);
            Assert.InRange(r, 4.8e-3, 5.2e-3);
            double expected = Designs.CoaxV * Math.Log(Designs.CoaxB / r) / Math.Log(Designs.CoaxB / Designs.CoaxA);
            double shown = double.Parse(phiText, CultureInfo.InvariantCulture);
            Assert.InRange(shown, expected * 0.99, expected * 1.01);

            // Screenshot as an artifact.
            string shot = Path.Combine(folder, "report-screenshot.png");
            driver.GetScreenshot().SaveAsFile(shot);
            output.WriteLine("screenshot: " + shot);

            // No console errors (collected last so that the pointer handler ran too).
            var errors = driver.Manage().Logs.GetLog(LogType.Browser).Where(e => e.Level >= LogLevel.Severe).Select(e => e.Message).ToList();
            Assert.True(errors.Count == 0, "console errors: " + string.Join(" | ", errors));
        }
        finally
        {
            try { Directory.Delete(profile, recursive: true); } catch (IOException) { } catch (UnauthorizedAccessException) { }
        }
    }

    private static void AssertSame(double expected, string shown)
    {
        double v = double.Parse(shown, CultureInfo.InvariantCulture);
        Assert.True(Math.Abs(v - expected) <= 1e-12 * Math.Abs(expected), $"page shows {shown}, results.json has {expected:R}");
    }
}
