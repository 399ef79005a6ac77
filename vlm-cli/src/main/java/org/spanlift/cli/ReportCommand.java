package org.spanlift.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;

import org.spanlift.cli.options.LongSolveNotice;
import org.spanlift.cli.options.AlphaList;
import org.spanlift.balance.BalanceStudy;
import org.spanlift.balance.CentreOfGravity;
import org.spanlift.cli.options.BalanceOptions;
import org.spanlift.cli.options.ClMaxOptions;
import org.spanlift.cli.options.CommonLift;
import org.spanlift.cli.options.FlightOptions;
import org.spanlift.cli.options.Format;
import org.spanlift.cli.options.InputFiles;
import org.spanlift.cli.options.OffersFormats;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.options.UnitsOption;
import org.spanlift.cli.plot.FigureContext;
import org.spanlift.cli.plot.FigureOutput;
import org.spanlift.cli.report.ReportPage;
import org.spanlift.cli.report.WingSummary;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.Wing;
import org.spanlift.input.RefusedException;
import org.spanlift.io.WingFileReader;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.MissingSectionDataException;
import org.spanlift.stall.StallStudy;
import org.spanlift.washout.WashoutDesign;
import org.spanlift.washout.WashoutRequirement;
import org.spanlift.cli.options.WashoutOptions;
import org.spanlift.cli.plot.Plots;
import org.spanlift.input.InputException;


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
    String commonLift;

    /** The common CL, read from {@link #commonLift}. */
    private double cl;

    @Mixin
    OutputOptions output;

    @Mixin
    FlightOptions flight;

    @Mixin
    ClMaxOptions clMax;

    @Mixin
    UnitsOption units;

    @Mixin
    WashoutOptions washout;

    @Mixin
    BalanceOptions balance;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Format format = FigureOutput.format(output, FORMATS);
        output.check(InputFiles.wing(file));
        List<Double> alphas = AlphaList.parse(alpha);
        List<Double> curve = AlphaList.parse(range);
        cl = CommonLift.parse(commonLift);
        Wing wing = WingFileReader.read(file);
        WingAnalysis analysis = LongSolveNotice.analyse(wing, spec.commandLine().getErr());
        double[] asked = analysis.deflections(flight.deflections(wing));
        double[] clean = StallStudy.cleanDeflections(wing, asked);
        Optional<FlightCondition> condition = flight.condition();
        WingSummary summary = WingSummary.of(file, wing, analysis, clean, cl);
        Optional<WingSummary> flaps = StallStudy.anyFlapDeflected(wing, asked)
                ? Optional.of(WingSummary.of(file, wing, analysis, asked, cl)) : Optional.empty();
        Wing fineWing = WingSummary.doubledStrips(wing);
        WingAnalysis fineAnalysis = LongSolveNotice.analyse(fineWing, spec.commandLine().getErr());
        WingSummary fine = WingSummary.of(file, fineWing, fineAnalysis, clean, cl);
        Optional<StallStudy> stall = Optional.empty();
        Optional<StallStudy> stallFine = Optional.empty();
        String unavailable = "";
        try {
            stall = Optional.of(StallStudy.of(analysis, asked, clMax.assumed(), condition));
            stallFine = Optional.of(StallStudy.of(fineAnalysis, clean, Optional.empty(), clMax.assumed(), condition));
        } catch (RefusedException e) {
            unavailable = e.getMessage();
        }
        double[] drawn = StallStudy.anyFlapDeflected(wing, asked) ? asked : clean;
        Optional<ReportPage.Washout> washoutAnswer = Optional.empty();
        if (washout.asked()) {
            List<WashoutRequirement> requirements = washout.requirements(wing);
            double[] bounds = washout.bounds();
            WashoutDesign.Result r;
            try {
                r = WashoutDesign.find(wing, clean, requirements, cl, clMax.assumed(), condition, bounds[0], bounds[1]);
            } catch (MissingSectionDataException e) {
                throw new InputException(file.toString(), 0, "sections", e.getMessage());
            }
            washoutAnswer = Optional.of(new ReportPage.Washout(requirements, r, Plots.washoutTrade(wing.name(), r,
                    requirements, cl, FigureContext.of(wing, clean, condition))));
        }
        List<BalanceStudy> balances = new ArrayList<>();
        for (CentreOfGravity cg : balance.centres()) {
            try {
                balances.add(BalanceStudy.of(analysis, asked, cg, condition, clMax.assumed()));
            } catch (MissingSectionDataException e) {
                throw new InputException(file.toString(), 0, "sections", e.getMessage());
            }
        }
        String html = ReportPage.build(new ReportPage.Inputs(summary, flaps, fine, stall, stallFine, unavailable,
                condition, flight.reynoldsRule(wing), FigureContext.of(wing, drawn, condition), alphas, curve,
                units.units(wing.displayUnit()), new VersionProvider().getVersion()[0], washoutAnswer, balances));
        assert format == Format.HTML;
        output.write(html, spec.commandLine().getOut());
        return 0;
    }

    @Override
    public Set<Format> formats() {
        return FORMATS;
    }
}
