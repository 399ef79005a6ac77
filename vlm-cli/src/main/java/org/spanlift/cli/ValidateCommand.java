package org.spanlift.cli;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;

import org.spanlift.cli.options.Format;
import org.spanlift.cli.options.OffersFormats;
import org.spanlift.cli.options.OutputOptions;
import org.spanlift.cli.output.Json;
import org.spanlift.cli.output.TextTable;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.input.InputException;
import org.spanlift.validation.cases.CaseResult;
import org.spanlift.validation.cases.CaseRunner;
import org.spanlift.validation.cases.ReferenceCase;
import org.spanlift.validation.cases.ReferenceCases;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code spanlift validate}: the reference cases, each against its published value. */
@Command(name = "validate", mixinStandardHelpOptions = true,
        description = {"Run the validation cases: each result against a published or textbook reference, with its "
                + "source, tolerance and a lattice-refinement study.",
                "Exit code 0 when every case passes, 1 when any fails."})
public final class ValidateCommand implements Callable<Integer>, OffersFormats {

    /** The formats this command writes. */
    static final Set<Format> FORMATS = Collections.unmodifiableSet(EnumSet.of(Format.TABLE, Format.JSON));

    @Option(names = "--case", paramLabel = "NAME", description = "Run only this case.")
    String caseName;

    @Mixin
    OutputOptions output;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Format format = output.format(FORMATS);
        output.check(List.of());
        List<ReferenceCase> cases = ReferenceCases.all();
        if (caseName != null) {
            cases = cases.stream().filter(c -> c.name().equals(caseName)).toList();
            if (cases.isEmpty()) {
                throw new InputException("--case", 0, "", "no case named '" + caseName + "'; the cases are: "
                        + String.join(", ", ReferenceCases.all().stream().map(ReferenceCase::name).toList()));
            }
        }
        List<CaseResult> results = CaseRunner.runAll(cases);
        String text = format == Format.JSON ? Json.write(json(results)) : table(results);
        output.write(text, spec.commandLine().getOut());
        return results.stream().allMatch(CaseResult::pass) ? 0 : SpanliftCommand.EXIT_FAILED_CASES;
    }

    static Map<String, Object> latticeJson(LatticeSpec l) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("strips", l.strips());
        m.put("rows", l.rows());
        m.put("strip-spacing", l.stripSpacing().name().toLowerCase(Locale.ROOT));
        m.put("row-spacing", l.rowSpacing().name().toLowerCase(Locale.ROOT));
        return m;
    }

    private static Map<String, Object> json(List<CaseResult> results) {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("passed", (int) results.stream().filter(CaseResult::pass).count());
        root.put("failed", (int) results.stream().filter(r -> !r.pass()).count());
        List<Object> list = new ArrayList<>();
        for (CaseResult r : results) {
            ReferenceCase c = r.referenceCase();
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("case", c.name());
            m.put("quantity", c.quantity());
            m.put("reference", c.reference());
            m.put("source", c.source());
            m.put("lattice", latticeJson(c.lattice()));
            m.put("result", r.result());
            m.put("converged", r.converged());
            m.put("order", r.order());
            m.put("error_pct", r.errorPct());
            m.put("tolerance_pct", c.tolerancePct());
            m.put("tolerance_reason", c.toleranceWhy());
            m.put("pass", r.pass());
            List<Object> study = new ArrayList<>();
            for (CaseResult.Density d : r.study()) {
                Map<String, Object> one = new LinkedHashMap<>();
                one.put("lattice", latticeJson(d.lattice()));
                one.put("result", d.result());
                study.add(one);
            }
            m.put("study", study);
            list.add(m);
        }
        root.put("cases", list);
        return root;
    }

    private static String lattice(LatticeSpec l) {
        return l.strips() + "x" + l.rows() + " " + spacing(l.stripSpacing().name()) + "/"
                + spacing(l.rowSpacing().name());
    }

    private static String spacing(String name) {
        return name.equals("COSINE") ? "cos" : "uni";
    }

    private static String number(double v) {
        double a = Math.abs(v);
        if (a != 0 && (a < 1e-3 || a >= 1e5)) {
            return String.format(Locale.ROOT, "%.4e", v);
        }
        return TextTable.fixed(v, 5);
    }

    private static String table(List<CaseResult> results) {
        TextTable t = new TextTable(List.of("case", "reference", "result", "lattice", "converged", "order", "error %",
                "tol %", "pass", "src", "quantity")).leftAlign(3, 8, 9, 10);
        StringBuilder notes = new StringBuilder();
        int n = 0;
        for (CaseResult r : results) {
            ReferenceCase c = r.referenceCase();
            n++;
            t.row(List.of(c.name(), number(c.reference()), number(r.result()), lattice(c.lattice()),
                    r.converged() == null ? "-" : number(r.converged()),
                    r.order() == null ? "-" : TextTable.fixed(r.order(), 2), TextTable.fixed(r.errorPct(), 3),
                    TextTable.fixed(c.tolerancePct(), 2), r.pass() ? "pass" : "FAIL", "[" + n + "]", c.quantity()));
            notes.append(String.format(Locale.ROOT, "[%d] %s%n    tolerance: %s%n", n, c.source(), c.toleranceWhy()));
        }
        long failed = results.stream().filter(r -> !r.pass()).count();
        StringBuilder b = new StringBuilder();
        b.append("Spanlift validation: ").append(results.size()).append(" cases, ").append(results.size() - failed)
                .append(" pass, ").append(failed).append(" fail\n\n");
        b.append(t.render());
        b.append("\n  result and error: on the case's lattice (strips per half x rows, spacing strips/rows).\n"
                + "  converged: Richardson extrapolation of the refinement study (each lattice twice as dense),\n"
                + "  given only where it converges monotonically with an observed order from 0.5 to 4;\n"
                + "  order: the observed order (shown wherever the study is monotone). Deviation cases\n"
                + "  (reference 0) report the departure itself in percent.\n\nSources and tolerances\n");
        b.append(notes);
        return b.toString();
    }

    @Override
    public Set<Format> formats() {
        return FORMATS;
    }
}
