package org.spanlift.cli.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.spanlift.cli.output.DisplayUnits;
import org.spanlift.cli.plot.Figure;
import org.spanlift.cli.plot.FigureContext;
import org.spanlift.cli.plot.Plots;
import org.spanlift.cli.plot.SvgWriter;
import org.spanlift.geometry.Wing;
import org.spanlift.results.Solution;
import org.spanlift.solve.WingAnalysis;

/** The side-by-side comparison page: planforms and span loads overlaid, and the table of differences. */
public final class ComparePage {

    private ComparePage() {
    }

    /**
     * @param u the units of the table (the figures draw lengths in its length unit)
     */
    public static String build(Comparison cmp, List<Double> rangeDeg, DisplayUnits u, String version) {
        List<WingSummary> wings = cmp.wings();
        List<String> labels = cmp.labels();
        Html h = Html.page("Spanlift comparison of " + wings.size() + " wings");
        h.line("<header class=\"title\">");
        h.el("p", "class=\"kicker\"", "Spanlift wing comparison");
        h.el("h1", wings.size() + " wings side by side");
        h.el("p", "class=\"meta\"", "Lengths in " + u.length().symbol() + ", angles in degrees; aerodynamic rows at "
                + "the common CL " + Html.fixed(cmp.cl(), 2) + " with every flap at zero; differences are from wing "
                + labels.get(0) + ".");
        String condition = conditionText(cmp, u);
        if (!condition.isEmpty()) {
            h.el("p", "class=\"meta\"", condition);
        }
        h.line("</header>");
        h.line("<ul class=\"wings\">");
        for (int i = 0; i < wings.size(); i++) {
            Wing w = wings.get(i).wing();
            h.raw("<li><span class=\"legend-key\">").text(labels.get(i)).raw("</span> ").text(w.name())
                    .raw(" <span class=\"meta\">(").text(wings.get(i).file().getFileName().toString() + "; "
                            + ReportPage.deflectionText(w, wings.get(i).deflections())).line(")</span></li>");
        }
        h.line("</ul>");
        h.caution();
        h.el("h2", "Table");
        List<String> header = new ArrayList<>(List.of("quantity", "unit"));
        header.addAll(labels);
        for (int i = 1; i < labels.size(); i++) {
            header.add(labels.get(i) + " \u2212 " + labels.get(0));
        }
        List<List<String>> rows = new ArrayList<>();
        for (Comparison.Row r : cmp.rows()) {
            List<String> row = new ArrayList<>(List.of(r.label(), r.unit(u).replace("^2", "\u00b2")));
            for (int i = 0; i < wings.size(); i++) {
                row.add(cell(cmp.value(r, i), r, u, false));
            }
            for (int i = 1; i < wings.size(); i++) {
                OptionalDouble d = cmp.difference(r, i);
                OptionalDouble base = cmp.value(r, 0);
                String text = cell(d, r, u, true);
                if (d.isPresent() && base.isPresent() && base.getAsDouble() != 0) {
                    text += " (" + Html.signed(100 * d.getAsDouble() / Math.abs(base.getAsDouble()), 1) + " %)";
                }
                row.add(text);
            }
            rows.add(row);
        }
        h.table("wide compare", null, header, rows);
        for (int i = 0; i < cmp.entries().size(); i++) {
            for (String note : cmp.entries().get(i).notes()) {
                h.el("p", "class=\"meta\"", labels.get(i) + ": " + note);
            }
        }
        h.el("h2", "Figures");
        List<Wing> ws = wings.stream().map(WingSummary::wing).toList();
        List<String> keyed = new ArrayList<>();
        for (int i = 0; i < wings.size(); i++) {
            keyed.add(labels.get(i) + ": " + ws.get(i).name());
        }
        List<Solution> atCl = wings.stream().map(WingSummary::spanLoadAtCl).toList();
        List<WingAnalysis> analyses = wings.stream().map(WingSummary::analysis).toList();
        List<FigureContext> contexts = wings.stream()
                .map(w -> FigureContext.of(w.wing(), w.deflections(), Optional.empty())).toList();
        figure(h, Plots.planformOverlay(ws, keyed, labels, contexts, u.length()));
        figure(h, Plots.spanLoadOverlay(ws, atCl, keyed, labels, contexts, cmp.cl()));
        figure(h, Plots.liftOverlay(analyses, keyed, labels, contexts, rangeDeg));
        h.line("<footer>");
        h.text("Made by " + version + ". Every wing on its own reference values; the same files and options give "
                + "the same page.");
        h.line("</footer>");
        return h.close();
    }

    /** The flight condition in words: weight, load factor, pressure altitude, load case, flaps; empty if none. */
    public static String conditionText(Comparison cmp, DisplayUnits u) {
        List<String> parts = new ArrayList<>();
        cmp.condition().ifPresent(fc -> {
            parts.add("weight " + u.weight(fc.weight()));
            parts.add("pressure altitude " + u.altitude(fc.atmosphere().pressureAltitude()));
            parts.add("stall speeds at 1 g");
        });
        cmp.loadCase().ifPresent(lc -> parts.add("load case n " + Html.fixed(lc.loadFactor(), 2) + " at "
                + u.speed(lc.equivalentSpeed()) + " EAS"));
        if (cmp.flapsDeg().isPresent()) {
            parts.add("flaps " + Html.fixed(cmp.flapsDeg().getAsDouble(), 0) + "\u00b0 for the rows marked flaps");
        }
        return parts.isEmpty() ? "" : "Condition: " + String.join(", ", parts) + ".";
    }

    private static void figure(Html h, Figure f) {
        h.raw("<figure id=\"figure-").raw(f.id()).line("\">");
        h.line(SvgWriter.element(f));
        h.raw("<figcaption><b>").text(f.title()).raw(".</b> ").text(f.description()).line("</figcaption>");
        h.line("</figure>");
    }

    private static String cell(OptionalDouble v, Comparison.Row r, DisplayUnits u, boolean signed) {
        if (v.isEmpty()) {
            return "\u2013";
        }
        double d = r.display(v.getAsDouble(), u);
        return signed ? Html.signed(d, r.decimals()) : Html.fixed(d, r.decimals());
    }
}
