package org.spanlift.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.concurrent.Callable;

import org.spanlift.balance.Balance;
import org.spanlift.balance.BalanceStudy;
import org.spanlift.balance.CentreOfGravity;
import org.spanlift.cli.options.BalanceOptions;
import org.spanlift.cli.options.ClMaxOptions;
import org.spanlift.cli.options.FlightOptions;
import org.spanlift.cli.options.Format;
import org.spanlift.cli.options.InputFiles;
import org.spanlift.cli.options.LongSolveNotice;
import org.spanlift.cli.options.OffersFormats;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.options.UnitsOption;
import org.spanlift.cli.output.Cautions;
import org.spanlift.cli.output.DisplayUnits;
import org.spanlift.cli.output.Json;
import org.spanlift.cli.output.Results;
import org.spanlift.cli.output.TextTable;
import org.spanlift.flight.FlightCondition;
import org.spanlift.geometry.Wing;
import org.spanlift.input.InputException;
import org.spanlift.input.RefusedException;
import org.spanlift.input.quantity.PhysicalRange;
import org.spanlift.input.quantity.QuantityFormatException;
import org.spanlift.io.WingFileReader;
import org.spanlift.solve.WingAnalysis;
import org.spanlift.stall.MissingSectionDataException;
import org.spanlift.vocabulary.ResultKey;
import org.spanlift.vocabulary.Vocabulary;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code spanlift balance}: neutral point, static margins, pitch derivatives, trim and trimmed stall speeds. */
@Command(name = "balance", mixinStandardHelpOptions = true,
        description = {"The configuration in balance: the stick-fixed neutral point and the static margin at each "
                + "centre of gravity, the pitch derivatives, a trim table of level flight, the trimmed stall speeds "
                + "(power off, with the tail's load) and the forward limit of the centre of gravity that elevator "
                + "power sets at the stall.",
            "Trim needs a control of kind elevator on a surface whose role is tail or canard; the trim table and the "
                + "stall speeds need --weight."})
public final class BalanceCommand implements Callable<Integer>, OffersFormats {

    static final Set<Format> FORMATS = Collections.unmodifiableSet(EnumSet.of(Format.TABLE, Format.JSON));

    /** The configuration CLs of the default trim table. */
    static final double[] DEFAULT_TRIM_CL = {0.2, 0.4, 0.6, 0.8, 1.0, 1.2};

    @Parameters(index = "0", paramLabel = "FILE", description = "The wing file (.wing.yaml).")
    Path file;

    @Mixin
    BalanceOptions balance;

    @Option(names = "--trim-speed", paramLabel = "V",
            description = "An equivalent airspeed of the trim table, with a unit (90kt, 45m/s). Repeatable. Default: "
                    + "the speeds of configuration CL 0.2 to 1.2 in steps of 0.2 below the trimmed stall.")
    List<String> trimSpeeds = List.of();

    @Mixin
    ClMaxOptions clMax;

    @Mixin
    OutputOptions output;

    @Mixin
    FlightOptions flight;

    @Mixin
    UnitsOption units;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Format format = output.format(FORMATS);
        output.check(InputFiles.wing(file));
        units.check(format);
        FlightOptions.refuse(spec, "balance trims level flight at 1 g; give the trim table's speeds with --trim-speed",
                "--speed", "--true-speed", "--load-factor");
        if (!balance.asked()) {
            throw new InputException("--cg", 0, "", "missing; expected at least one centre of gravity, such as --cg "
                    + "25%mac or --cg 0.62m");
        }
        List<CentreOfGravity> centres = balance.centres();
        List<Double> speeds = new ArrayList<>();
        for (String v : trimSpeeds) {
            try {
                speeds.add(PhysicalRange.SPEED.parse(v));
            } catch (QuantityFormatException e) {
                throw new InputException("--trim-speed", 0, "", e.getMessage());
            }
        }
        Wing wing = WingFileReader.read(file);
        Optional<FlightCondition> condition = flight.condition();
        if (!speeds.isEmpty() && condition.isEmpty()) {
            throw new InputException("--trim-speed", 0, "", "the trim table needs the weight: give --weight too");
        }
        WingAnalysis analysis = LongSolveNotice.analyse(wing, spec.commandLine().getErr());
        double[] asked = analysis.deflections(flight.deflections(wing));
        List<BalanceStudy> studies = new ArrayList<>();
        List<List<Balance.TrimPoint>> trims = new ArrayList<>();
        for (CentreOfGravity cg : centres) {
            BalanceStudy study;
            try {
                study = BalanceStudy.of(analysis, asked, cg, condition, clMax.assumed());
            } catch (MissingSectionDataException e) {
                throw new InputException(file.toString(), 0, "sections", e.getMessage());
            }
            studies.add(study);
            trims.add(condition.isPresent() && study.clean().hasElevator()
                    ? trimTable(study, condition.get(), speeds) : List.of());
        }
        String text = format == Format.JSON ? Json.write(json(wing, studies, trims, condition))
                : table(wing, studies, trims, condition, units.units(wing.displayUnit()));
        output.write(text, spec.commandLine().getOut());
        return 0;
    }

    /** The trim table of one centre of gravity, clean: the speeds asked, or those of the default CLs. */
    private static List<Balance.TrimPoint> trimTable(BalanceStudy study, FlightCondition condition,
            List<Double> speeds) {
        Balance b = study.clean();
        List<Double> at = new ArrayList<>(speeds);
        if (at.isEmpty()) {
            double s = b.analysis().wing().reference().area();
            double limit = study.stallClean().map(Balance.TrimmedStall::lift).orElse(Double.POSITIVE_INFINITY);
            for (double cl : DEFAULT_TRIM_CL) {
                if (cl < limit) {
                    at.add(Math.sqrt(2 * condition.liftForce() / (FlightCondition.seaLevelDensity() * s * cl)));
                }
            }
        }
        List<Balance.TrimPoint> rows = new ArrayList<>();
        for (double v : at) {
            try {
                rows.add(b.trim(study.cgX(), v, condition));
            } catch (RefusedException e) {
                // a speed that cannot be trimmed in the linear range is left out and said so below the table
            }
        }
        return rows;
    }

    private static Map<String, Object> json(Wing wing, List<BalanceStudy> studies, List<List<Balance.TrimPoint>> trims,
            Optional<FlightCondition> condition) {
        BalanceStudy first = studies.get(0);
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("name", wing.name());
        root.put("units", Map.of("length", "m", "speed", "m/s", "force", "N", "angle", "deg",
                "derivatives", "per radian; rate per radian of q c/(2V)"));
        Map<String, Object> np = new LinkedHashMap<>();
        Results.put(np, Vocabulary.select(Vocabulary.BALANCE, "neutral_point.x", "neutral_point.mac_fraction"), first);
        root.putAll(np);
        root.put("neutral_point_method", "dCm/dCL at small angles of attack (zero angle and elevator), stick fixed");
        root.put("mean_aerodynamic_chord", first.clean().meanAerodynamicChord());
        root.put("mac_leading_edge_x", first.clean().macPoint(0));
        root.put("fuselage_Cm_alpha", box(first.clean().fuselageSlope()));
        root.put("trim_available", first.clean().hasElevator());
        List<Object> cg = new ArrayList<>();
        List<Object> margins = new ArrayList<>();
        List<Object> derivatives = new ArrayList<>();
        List<Object> stall = new ArrayList<>();
        List<Object> trimRows = new ArrayList<>();
        for (int i = 0; i < studies.size(); i++) {
            BalanceStudy s = studies.get(i);
            Map<String, Object> one = new LinkedHashMap<>();
            Results.put(one, Vocabulary.BALANCE, s);
            cg.add(one.get("cg"));
            margins.add(one.get("static_margin"));
            derivatives.add(one.get("derivatives"));
            Map<String, Object> st = new LinkedHashMap<>();
            st.put("cg_x", s.cgX());
            st.putAll(asMap(one.get("stall_speed_trimmed")));
            st.put("elevator_at_stall", one.get("elevator_at_stall"));
            st.put("problem", s.stallProblem().orElse(null));
            stall.add(st);
            for (Balance.TrimPoint t : trims.get(i)) {
                Map<String, Object> row = new LinkedHashMap<>();
                row.put("cg_x", s.cgX());
                Results.put(row, Vocabulary.TRIM, t);
                trimRows.add(row);
            }
        }
        root.put("cg", cg);
        root.put("static_margin", margins);
        root.put("derivatives", derivatives);
        root.put("trim", trimRows);
        root.put("stall_speed_trimmed", stall);
        Map<String, Object> fwd = new LinkedHashMap<>();
        Results.put(fwd, Vocabulary.select(Vocabulary.BALANCE, "forward_limit.x", "forward_limit.mac_fraction"), first);
        root.put("forward_limit", fwd.get("forward_limit"));
        root.put("forward_limit_with", first.flaps().isPresent() ? "flaps" : "clean");
        root.put("weight", condition.map(c -> (Object) c.weight()).orElse(null));
        root.put("notes", notes(first));
        root.put("caution", Cautions.BALANCE);
        return root;
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> asMap(Object o) {
        return o instanceof Map<?, ?> m ? (Map<String, Object>) m : Map.of();
    }

    private static List<String> notes(BalanceStudy s) {
        List<String> n = new ArrayList<>();
        n.add("Stick-free stability is not computed.");
        n.add("The wake runs along the wing file's x axis; the tail efficiency factor is 1; no propeller slipstream; "
                + "out of ground effect.");
        if (s.clean().fuselageSlope().isPresent()) {
            n.add("The fuselage adds an empirical dCm/dalpha (Gilruth and White, NACA Report 711, 1941; its chart "
                    + "factor recalled from memory); no fuselage moment at zero angle of attack enters the trim.");
        }
        if (s.clean().hasElevator()) {
            n.add(s.clean().handbookElevator()
                    ? "The elevator's lift is the lattice's times the handbook plain-flap effectiveness at its "
                            + "deflection, which errs toward needing more elevator."
                    : "The elevator's chord fraction lies outside the handbook plain-flap data: its lift is the "
                            + "lattice's inviscid lift, which overstates elevator power at large deflections.");
            n.add("Stall points are power off; the trimmed stall carries the weight on wing and tail together.");
        }
        return n;
    }

    private static Object box(OptionalDouble v) {
        return v.isPresent() ? (Object) v.getAsDouble() : null;
    }

    private static String table(Wing wing, List<BalanceStudy> studies, List<List<Balance.TrimPoint>> trims,
            Optional<FlightCondition> condition, DisplayUnits u) {
        BalanceStudy first = studies.get(0);
        Balance b = first.clean();
        StringBuilder out = new StringBuilder(wing.name()).append(" in balance\n\n");
        out.append(String.format(Locale.ROOT, "Neutral point, stick fixed (dCm/dCL at small angles of attack): x %s, "
                + "%.1f%% of the MAC%n", length(first.neutralPoint().x(), u),
                100 * first.neutralPoint().macFraction()));
        out.append(String.format(Locale.ROOT, "Mean aerodynamic chord %s, leading edge at x %s%n",
                length(b.meanAerodynamicChord(), u), length(b.macPoint(0), u)));
        if (first.downwashGradient().isPresent()) {
            out.append(String.format(Locale.ROOT, "Downwash gradient at the tail: %.3f (the lattice's, the tail "
                    + "removed)%n", first.downwashGradient().getAsDouble()));
        }
        if (b.fuselageSlope().isPresent()) {
            out.append(String.format(Locale.ROOT, "Fuselage: dCm/dalpha %+.3f per rad (empirical)%n",
                    b.fuselageSlope().getAsDouble()));
        }
        out.append('\n').append(derivativeTable(studies, u));
        if (!b.hasElevator()) {
            out.append("\nTrim is unavailable: the configuration has no elevator (a control of kind elevator on the "
                    + "tail or canard).\n");
        } else if (condition.isEmpty()) {
            out.append("\nGive --weight for the trim table, the trimmed stall speeds and the forward limit.\n");
        } else {
            for (int i = 0; i < studies.size(); i++) {
                out.append('\n').append(trimTable(studies.get(i), trims.get(i), condition.get(), u));
            }
            out.append('\n').append(stallTable(studies, u));
        }
        out.append('\n');
        for (String n : notes(first)) {
            out.append(TextTable.wrap(n)).append('\n');
        }
        out.append('\n').append(TextTable.wrap(Cautions.BALANCE)).append('\n');
        return out.toString();
    }

    private static String length(double metres, DisplayUnits u) {
        return TextTable.fixed(u.convert(org.spanlift.vocabulary.ResultUnit.METRE, metres), 3) + " "
                + u.symbol(org.spanlift.vocabulary.ResultUnit.METRE);
    }

    private static String cgName(BalanceStudy s, DisplayUnits u) {
        return String.format(Locale.ROOT, "cg %s (%.1f%% MAC)", length(s.cgX(), u), 100 * s.cgMacFraction());
    }

    /** Causes down the side, effects across: lift, and moment about each centre of gravity. */
    private static String derivativeTable(List<BalanceStudy> studies, DisplayUnits u) {
        List<String> headers = new ArrayList<>(List.of("per radian"));
        for (BalanceStudy s : studies) {
            String at = studies.size() == 1 ? "" : String.format(Locale.ROOT, " @%.0f%%", 100 * s.cgMacFraction());
            headers.add("CL" + at);
            headers.add("Cm" + at);
        }
        TextTable t = new TextTable(headers).leftAlign(0);
        String[][] rows = {{"angle of attack", "derivatives.CL_alpha", "derivatives.Cm_alpha"},
            {"pitch rate q c/(2V)", "derivatives.CL_q", "derivatives.Cm_q"},
            {"elevator", "derivatives.CL_de", "derivatives.Cm_de"}};
        for (String[] r : rows) {
            List<String> cells = new ArrayList<>(List.of(r[0]));
            for (BalanceStudy s : studies) {
                for (int k = 1; k <= 2; k++) {
                    ResultKey<BalanceStudy> key = Vocabulary.find(Vocabulary.BALANCE, r[k]);
                    cells.add(Results.cell(key, s, u));
                }
            }
            t.row(cells);
        }
        List<ResultKey<BalanceStudy>> keys = Vocabulary.select(Vocabulary.BALANCE, "cg.x", "cg.mac_fraction",
                "static_margin");
        TextTable margins = new TextTable(keys.stream().map(k -> Results.label(k, u)).toList());
        for (BalanceStudy s : studies) {
            margins.row(keys.stream().map(k -> Results.cell(k, s, u)).toList());
        }
        return margins.render() + "\nPitch derivatives (rate per radian of q c/(2V); moments about each centre of "
                + "gravity):\n" + t.render();
    }

    private static String trimTable(BalanceStudy s, List<Balance.TrimPoint> rows, FlightCondition condition,
            DisplayUnits u) {
        List<ResultKey<Balance.TrimPoint>> keys = Vocabulary.select(Vocabulary.TRIM, "speed_eas", "CL", "alpha_deg",
                "elevator_deg", "wing_CL", "tail_CL", "tail_load", "CD", "trim_CDi", "within_limits");
        List<String> headers = keys.stream().map(k -> Results.label(k, u)).toList();
        TextTable t = new TextTable(headers);
        for (Balance.TrimPoint p : rows) {
            t.row(keys.stream().map(k -> Results.cell(k, p, u)).toList());
        }
        String thrust = s.clean().analysis().wing().thrustLineHeight().isPresent()
                ? String.format(Locale.ROOT, ", thrust = drag on a line %s above the cg",
                        length(s.clean().analysis().wing().thrustLineHeight().getAsDouble(), u)) : ", no thrust line";
        return "Trim in level flight at " + cgName(s, u) + ", " + u.weight(condition.weight()) + thrust + ", clean:\n"
                + (rows.isEmpty() ? "  no speed could be trimmed within the linear range\n" : t.render());
    }

    private static String stallTable(List<BalanceStudy> studies, DisplayUnits u) {
        boolean flaps = studies.get(0).flaps().isPresent();
        List<String> names = new ArrayList<>(List.of("stall_speed_trimmed.clean_eas", "elevator_at_stall.clean_deg",
                "stall_speed_trimmed.clean_CL"));
        if (flaps) {
            names.addAll(List.of("stall_speed_trimmed.flaps_eas", "elevator_at_stall.flaps_deg"));
        }
        names.add("elevator_at_stall.within_limits");
        List<ResultKey<BalanceStudy>> keys = Vocabulary.select(Vocabulary.BALANCE, names.toArray(String[]::new));
        List<String> headers = new ArrayList<>(List.of("centre of gravity"));
        keys.forEach(k -> headers.add(Results.label(k, u)));
        TextTable t = new TextTable(headers).leftAlign(0);
        List<String> problems = new ArrayList<>();
        for (BalanceStudy s : studies) {
            List<String> cells = new ArrayList<>(List.of(cgName(s, u)));
            keys.forEach(k -> cells.add(Results.cell(k, s, u)));
            t.row(cells);
            s.stallProblem().ifPresent(p -> problems.add(cgName(s, u) + ": " + p));
        }
        BalanceStudy first = studies.get(0);
        String basis = first.stallClean().map(x -> x.basis() == Balance.StallBasis.MAX_LIFT
                ? "the maximum lift of the section lift curves" : "the linear stall onset, which errs safe")
                .orElse("-");
        StringBuilder b = new StringBuilder("Trimmed stall, power off, at " + basis + ":\n").append(t.render());
        for (String p : problems) {
            b.append(TextTable.wrap("  " + p)).append('\n');
        }
        if (first.forwardLimit().isPresent()) {
            double x = first.forwardLimit().getAsDouble();
            b.append(String.format(Locale.ROOT, "Forward limit of the centre of gravity (elevator at its up stop "
                    + "at the "
                    + "stall%s): x %s, %.1f%% of the MAC%n", first.flaps().isPresent() ? " with flaps" : "",
                    length(x, u), 100 * first.clean().macFraction(x)));
        } else if (first.stallProblem().isEmpty()) {
            b.append("Forward limit: give the elevator's limits (limits: [least, greatest] in degrees) for it.\n");
        }
        return b.toString();
    }

    @Override
    public Set<Format> formats() {
        return FORMATS;
    }
}
