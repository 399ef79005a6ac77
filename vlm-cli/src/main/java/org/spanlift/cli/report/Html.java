package org.spanlift.cli.report;

import java.util.List;
import java.util.Locale;

/**
 * A small HTML builder for Spanlift's pages. Output is well-formed XML as well as HTML (no named entities
 * beyond the XML five, every element closed), so tests can read it with the JDK's XML parser.
 */
final class Html {

    private final StringBuilder b = new StringBuilder();

    static String esc(String s) {
        StringBuilder out = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '&' -> out.append("&amp;");
                case '"' -> out.append("&quot;");
                default -> out.append(c);
            }
        }
        return out.toString();
    }

    static String fixed(double v, int decimals) {
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        if (s.matches("-0\\.?0*")) {
            s = s.substring(1); // no minus sign on a value that rounds to zero
        }
        // a true minus sign reads better than a hyphen in tables
        return s.startsWith("-") ? "\u2212" + s.substring(1) : s;
    }

    static String signed(double v, int decimals) {
        String s = fixed(v, decimals);
        return v > 0 || (v == 0 && !s.startsWith("\u2212")) ? "+" + s : s;
    }

    Html raw(String s) {
        b.append(s);
        return this;
    }

    Html line(String s) {
        b.append(s).append('\n');
        return this;
    }

    Html text(String s) {
        b.append(esc(s));
        return this;
    }

    Html el(String tag, String text) {
        b.append('<').append(tag).append('>').append(esc(text)).append("</").append(tag).append(">\n");
        return this;
    }

    Html el(String tag, String attrs, String text) {
        b.append('<').append(tag).append(' ').append(attrs).append('>').append(esc(text)).append("</").append(tag)
                .append(">\n");
        return this;
    }

    /** A table: header cells, then rows of cells (already formatted text). The first column is a row header. */
    Html table(String cssClass, String caption, List<String> header, List<List<String>> rows) {
        b.append("<table class=\"").append(cssClass).append("\">\n");
        if (caption != null) {
            b.append("<caption>").append(esc(caption)).append("</caption>\n");
        }
        b.append("<thead><tr>");
        for (String h : header) {
            b.append("<th scope=\"col\">").append(esc(h)).append("</th>");
        }
        b.append("</tr></thead>\n<tbody>\n");
        for (List<String> row : rows) {
            b.append("<tr>");
            for (int i = 0; i < row.size(); i++) {
                if (i == 0) {
                    b.append("<th scope=\"row\">").append(esc(row.get(i))).append("</th>");
                } else {
                    b.append("<td>").append(esc(row.get(i))).append("</td>");
                }
            }
            b.append("</tr>\n");
        }
        b.append("</tbody>\n</table>\n");
        return this;
    }

    /** The opening of a page: doctype, head with the inline style sheet, body. */
    static Html page(String title) {
        Html h = new Html();
        h.line("<!DOCTYPE html>");
        h.line("<html lang=\"en\">");
        h.line("<head>");
        h.line("<meta charset=\"utf-8\"/>");
        h.line("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>");
        h.line("<meta name=\"generator\" content=\"Spanlift\"/>");
        h.raw("<title>").text(title).line("</title>");
        h.raw("<style>").raw(CSS).line("</style>");
        h.line("</head>");
        h.line("<body>");
        h.line("<main>");
        return h;
    }

    String close() {
        b.append("</main>\n</body>\n</html>\n");
        return b.toString();
    }

    /** The safety caution every page carries. */
    Html caution() {
        line("<aside class=\"caution\" role=\"note\">");
        el("h2", "Before you rely on these numbers");
        el("p", "These results come from inviscid, linear vortex-lattice theory: they inform design, they do not "
                + "certify it. They leave out viscous and compressibility effects and the fuselage; stall onset is "
                + "a critical-section estimate from linear theory and section data, and stall speeds are for the "
                + "wing alone (the tail's download, which raises the real stall speed, is not included). Check them "
                + "against flight test, test data and established methods, and defer to the applicable "
                + "airworthiness standards and to licensed engineering practice before anything is built or flown.");
        line("</aside>");
        return this;
    }

    static final String CSS = """
            :root { --ink: #1a1a1a; --muted: #5c5c5c; --rule: #d6d6d6; --accent: #0072b2; --warn: #d55e00;
              --paper: #ffffff; --band: #f4f6f8; }
            * { box-sizing: border-box; }
            html { background: var(--paper); color: var(--ink); }
            body { margin: 0; font: 15px/1.5 "DejaVu Sans", "Segoe UI", "Helvetica Neue", Arial, sans-serif; }
            main { max-width: 980px; margin: 0 auto; padding: 28px 28px 48px; }
            header.title { border-bottom: 3px solid var(--accent); padding-bottom: 12px; margin-bottom: 20px; }
            .kicker { text-transform: uppercase; letter-spacing: 0.12em; font-size: 12px; color: var(--accent);
              font-weight: bold; margin: 0; }
            h1 { font-size: 28px; line-height: 1.2; margin: 4px 0 6px; }
            h2 { font-size: 19px; margin: 30px 0 10px; padding-bottom: 4px; border-bottom: 1px solid var(--rule); }
            h3 { font-size: 16px; margin: 18px 0 6px; }
            p.meta { color: var(--muted); margin: 0; font-size: 13px; }
            code, .mono { font-family: "DejaVu Sans Mono", Menlo, Consolas, monospace; font-size: 0.92em; }
            .keys { display: grid; grid-template-columns: repeat(auto-fit, minmax(200px, 1fr)); gap: 12px;
              margin: 12px 0 8px; padding: 0; list-style: none; }
            .keys li { background: var(--band); border-left: 4px solid var(--accent); padding: 10px 14px; }
            .keys .label { display: block; font-size: 12px; color: var(--muted); text-transform: uppercase;
              letter-spacing: 0.06em; }
            .keys .value { display: block; font-size: 22px; font-weight: bold; font-variant-numeric: tabular-nums; }
            .keys .note { display: block; font-size: 12px; color: var(--muted); }
            table { border-collapse: collapse; margin: 10px 0 16px; font-variant-numeric: tabular-nums; }
            caption { text-align: left; font-weight: bold; padding: 4px 0; caption-side: top; }
            th, td { padding: 5px 12px; border-bottom: 1px solid var(--rule); text-align: right; vertical-align: top; }
            thead th { border-bottom: 2px solid var(--ink); font-size: 13px; }
            tbody th { text-align: left; font-weight: normal; }
            td.text, th.text { text-align: left; }
            table.wide { width: 100%; }
            tr.diff td { color: var(--muted); }
            figure { margin: 18px 0 26px; break-inside: avoid; page-break-inside: avoid; }
            figure svg { display: block; width: 100%; height: auto; border: 1px solid var(--rule); }
            figcaption { font-size: 13px; color: var(--muted); margin-top: 6px; }
            figcaption b { color: var(--ink); }
            .caution { border: 1px solid var(--warn); border-left-width: 6px; padding: 4px 16px 6px; margin: 20px 0;
              background: #fff8f2; }
            .caution h2 { border: none; margin: 8px 0 4px; font-size: 16px; color: var(--warn); }
            .caution p { margin: 4px 0 8px; }
            .legend-key { display: inline-block; min-width: 1.8em; font-weight: bold; }
            ul.wings { padding-left: 1.2em; }
            footer { margin-top: 36px; padding-top: 10px; border-top: 1px solid var(--rule); color: var(--muted);
              font-size: 12px; }
            @media print {
              @page { size: A4; margin: 16mm 14mm; }
              body { font-size: 10.5pt; }
              main { max-width: none; padding: 0; }
              h2 { break-after: avoid; page-break-after: avoid; }
              table, .keys, .caution { break-inside: avoid; page-break-inside: avoid; }
              figure svg { border: none; }
              * { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
            }
            """;
}
