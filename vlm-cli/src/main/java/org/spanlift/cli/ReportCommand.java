package org.spanlift.cli;

import java.nio.file.Path;
import java.util.Collections;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Callable;

import org.spanlift.cli.options.AlphaList;
import org.spanlift.cli.options.CommonLift;
import org.spanlift.cli.options.ClMaxOptions;
import org.spanlift.cli.options.FlightOptions;
import org.spanlift.cli.options.Format;
import org.spanlift.cli.options.OffersFormats;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.plot.FigureContext;
import org.spanlift.cli.plot.FigureOutput;
import org.spanlift.cli.report.ReportPage;
import org.spanlift.cli.report.StallSummary;
import org.spanlift.cli.report.WingSummary;
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.MissingSectionDataException;
import org.spanlift.stall.StallStudy;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code spanlift report}: one self-contained HTML page about one wing. */
@Command(name = "report", mixinStandardHelpOptions = true,
        description = "Write a self-contained HTML report of a wing: description, key results, every plot, the "
                + "lattice and a convergence check.")
public final class ReportCommand implements Callable<Integer>, OffersFormats {

    /** The formats this command writes. */
    static final Set<Format> FORMATS = Collections.unmodifiableSet(EnumSet.of(Format.HTML));

    @Parameters(index = "0", paramLabel = "FILE", description = "The wing file (.wing.yaml).")
    Path file;

    @Option(names = {"-a", "--alpha"}, paramLabel = "LIST", defaultValue = "-4,0,4,8,12",
            description = "Angles of attack of the results table, degrees: a list or from:to:step. "
                    + "Default: ${DEFAULT-VALUE}.")
    String alpha;

    @Option(names = "--range", paramLabel = "FROM:TO:STEP", defaultValue = AlphaList.DEFAULT_CURVE,
            description = "Angles of the lift curve and polar, degrees. Default: ${DEFAULT-VALUE}.")
    String range;

    @Option(names = "--cl", paramLabel = "CL", defaultValue = "0.5",
            description = "The lift coefficient of the span load, e and CDi. Default: ${DEFAULT-VALUE}.")
    double cl;

    @Mixin
    OutputOptions output;

    @Mixin
    FlightOptions flight;

    @Mixin
    ClMaxOptions clMax;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Format format = FigureOutput.format(output, FORMATS);
        List<Double> alphas = AlphaList.parse(alpha);
        List<Double> curve = AlphaList.parse(range);
        CommonLift.check(cl);
        Wing wing = WingFileReader.read(file);
        WingAnalysis analysis = WingAnalysis.of(wing);
        double[] deflections = analysis.deflections(flight.deflections(wing));
        WingSummary summary = WingSummary.of(file, wing, analysis, deflections, cl);
        Wing fineWing = WingSummary.doubledStrips(wing);
        WingSummary fine = WingSummary.of(file, fineWing, WingAnalysis.of(fineWing), deflections, cl);
        StallSummary stall;
        try {
            StallStudy.Configuration c = StallStudy.configuration("report", analysis, deflections, clMax.assumed(),
                    flight.condition());
            stall = StallSummary.of(c.estimate(), c.speed());
        } catch (MissingSectionDataException e) {
            stall = StallSummary.unavailable(e.getMessage());
        }
        String html = ReportPage.build(summary, fine, stall, alphas, curve, flight.reynoldsRule(wing),
                FigureContext.of(wing, deflections, flight.condition()), new VersionProvider().getVersion()[0]);
        assert format == Format.HTML;
        output.write(html, spec.commandLine().getOut());
        return 0;
    }

    @Override
    public Set<Format> formats() {
        return FORMATS;
    }
}
