namespace SectionTwist.Rendering.Report;

/// <summary>The report's inline style sheet (system fonts, print-friendly, no external resources).</summary>
internal static class ReportStyle
{
    public const string Css = """
        :root { color-scheme: light; }
        body { margin: 0; background: #f3f4f6; color: #1d1d1f; font: 15px/1.5 "DejaVu Sans", Verdana, Arial, sans-serif; }
        main { max-width: 1040px; margin: 0 auto; padding: 24px 32px 48px; background: #fff; }
        h1 { font-size: 26px; margin: 8px 0 4px; }
        h2 { font-size: 20px; margin: 32px 0 10px; border-bottom: 2px solid #2c3e73; padding-bottom: 4px; }
        h3 { font-size: 16px; margin: 18px 0 6px; }
        .sub, .meta { margin: 2px 0; color: #555; }
        .status { padding: 8px 12px; border-radius: 4px; font-weight: bold; }
        .status.ok { background: #e5f4ea; color: #1e6b35; }
        .status.bad { background: #fdecea; color: #a4161a; }
        dl.figures { display: grid; grid-template-columns: repeat(auto-fill, minmax(220px, 1fr)); gap: 10px; margin: 0; }
        dl.figures div { border: 1px solid #d7dbe3; border-radius: 4px; padding: 8px 10px; background: #f8f9fb; }
        dl.figures div.alert { border-color: #e01030; background: #fdecea; }
        dt { font-size: 13px; color: #555; }
        dd { margin: 0; font-size: 18px; font-weight: bold; }
        table { border-collapse: collapse; margin: 12px 0 20px; width: 100%; font-size: 13px; }
        caption { text-align: left; font-weight: bold; padding: 4px 0; }
        th, td { border: 1px solid #d7dbe3; padding: 4px 8px; text-align: left; vertical-align: top; }
        td.num { text-align: right; font-variant-numeric: tabular-nums; }
        th[scope=row], thead th { text-align: left; }
        thead th { background: #eef1f6; }
        tr.alert td, tr.alert th { background: #fdecea; color: #a4161a; }
        figure { margin: 16px 0 24px; }
        figure img { max-width: 100%; height: auto; border: 1px solid #d7dbe3; }
        figcaption { font-size: 13px; color: #444; }
        .file { color: #777; }
        ul.warnings li { color: #8a4b00; }
        .caution { margin-top: 32px; padding: 12px 16px; border-left: 6px solid #e0a800; background: #fff8e1; }
        @media print { body { background: #fff; } main { padding: 0; } figure, table { break-inside: avoid; } }

        """;
}
