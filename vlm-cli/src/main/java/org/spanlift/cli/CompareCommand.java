package org.spanlift.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.concurrent.Callable;

import org.spanlift.cli.options.AlphaList;
import org.spanlift.cli.options.CommonLift;
import org.spanlift.cli.options.Format;
import org.spanlift.cli.options.OffersFormats;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.output.Csv;
import org.spanlift.cli.output.Json;
import org.spanlift.cli.output.TextTable;
import org.spanlift.cli.report.ComparePage;
import org.spanlift.cli.report.Comparison;
import org.spanlift.cli.report.WingSummary;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.io.WingFileReader;
import org.spanlift.results.Coefficients;
import org.spanlift.solve.WingAnalysis;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code spanlift compare}: several wings side by side, as a table or an HTML page. */
@Command(name = "compare", mixinStandardHelpOptions = true,
        description = "Compare wings side by side: area, span, aspect ratio, MAC, lift slope, zero-lift angle, and e "
                + "and CDi at a common CL, with the differences from the first; as a table, JSON, CSV or an HTML "
                + "page with the planforms and span loads overlaid.")
public final class CompareCommand implements Callable<Integer>, OffersFormats {

    /** The formats this command writes. */
    static final Set<Format> FORMATS = Collections.unmodifiableSet(EnumSet.of(Format.TABLE, Format.JSON, Format.CSV, Format.HTML));

    private static final int MAX_WINGS = 12;

    @Parameters(arity = "2..*", paramLabel = "FILE", description = "Two or more wing files; the first is the base.")
    List<Path> files;

    @Option(names = "--cl", paramLabel = "CL", defaultValue = "0.5",
            description = "The common lift coefficient of e, CDi and the span loads. Default: ${DEFAULT-VALUE}.")
    double cl;

    @Option(names = "--range", paramLabel = "FROM:TO:STEP", defaultValue = AlphaList.DEFAULT_CURVE,
            description = "Angles of the lift curves on the HTML page, degrees. Default: ${DEFAULT-VALUE}.")
    String range;

    @Mixin
    OutputOptions output;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Format format = output.format(FORMATS);
        if (files.size() > MAX_WINGS) {
            throw new InputException("compare", 0, "", "at most " + MAX_WINGS + " wings at once, got " + files.size());
        }
        CommonLift.check(cl);
        List<Double> curve = AlphaList.parse(range);
        List<String> labels = new ArrayList<>();
        List<WingSummary> wings = new ArrayList<>();
        for (int i = 0; i < files.size(); i++) {
            Wing wing = WingFileReader.read(files.get(i));
            WingAnalysis analysis = WingAnalysis.of(wing);
            double[] d = analysis.fileDeflections();
            if (!(Math.abs(cl) < analysis.liftCurve(d).slope())) {
                throw new InputException(files.get(i).toString(), 0, "", "CL " + cl + " is beyond this wing's linear "
                        + "range");
            }
            wings.add(WingSummary.of(files.get(i), wing, analysis, d, cl));
            labels.add(String.valueOf((char) ('A' + i)));
        }
        Comparison cmp = new Comparison(labels, wings, cl);
        String text = switch (format) {
            case JSON -> Json.write(cmp.json());
            case CSV -> csv(cmp);
            case HTML -> ComparePage.build(cmp, curve, new VersionProvider().getVersion()[0]);
            default -> table(cmp);
        };
        output.write(text, spec.commandLine().getOut());
        return 0;
    }


    private static String csv(Comparison cmp) {
        List<String> header = new ArrayList<>(List.of("quantity", "unit"));
        header.addAll(cmp.labels());
        for (int i = 1; i < cmp.labels().size(); i++) {
            header.add(cmp.labels().get(i) + "-" + cmp.labels().get(0));
        }
        Csv csv = new Csv(header);
        for (Comparison.Row r : cmp.rows()) {
            List<Object> cells = new ArrayList<>(List.of(r.key(), r.unit(LengthUnit.M)));
            for (int i = 0; i < cmp.wings().size(); i++) {
                cells.add(boxed(cmp.value(r, i)));
            }
            for (int i = 1; i < cmp.wings().size(); i++) {
                cells.add(boxed(cmp.difference(r, i)));
            }
            csv.row(cells.toArray());
        }
        return csv.toString();
    }

    private static Double boxed(OptionalDouble v) {
        return v.isPresent() ? v.getAsDouble() : null;
    }

    private static String table(Comparison cmp) {
        LengthUnit u = cmp.wings().get(0).wing().displayUnit();
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < cmp.wings().size(); i++) {
            b.append("  ").append(cmp.labels().get(i)).append("  ").append(cmp.wings().get(i).wing().name())
                    .append(" (").append(cmp.wings().get(i).file()).append(")\n");
        }
        b.append('\n');
        List<String> header = new ArrayList<>(List.of("quantity", "unit"));
        header.addAll(cmp.labels());
        for (int i = 1; i < cmp.labels().size(); i++) {
            header.add(cmp.labels().get(i) + "-" + cmp.labels().get(0));
        }
        TextTable t = new TextTable(header);
        for (Comparison.Row r : cmp.rows()) {
            List<String> row = new ArrayList<>(List.of(r.label(), r.unit(u)));
            for (int i = 0; i < cmp.wings().size(); i++) {
                OptionalDouble v = cmp.value(r, i);
                row.add(v.isPresent() ? TextTable.fixed(r.display(v.getAsDouble(), u), r.decimals()) : "-");
            }
            for (int i = 1; i < cmp.wings().size(); i++) {
                OptionalDouble v = cmp.difference(r, i);
                row.add(v.isPresent() ? signed(TextTable.fixed(r.display(v.getAsDouble(), u), r.decimals())) : "-");
            }
            t.row(row);
        }
        b.append(t.render());
        b.append(String.format(Locale.ROOT, "%n  Common CL %.3f. Lengths in %s (the first wing's unit); each "
                + "wing on its own reference values; CDi is induced drag only.%n", cmp.cl(), u.symbol()));
        return b.toString();
    }

    private static String signed(String s) {
        return s.startsWith("-") ? s : "+" + s;
    }

    @Override
    public Set<Format> formats() {
        return FORMATS;
    }
}
