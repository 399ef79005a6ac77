package org.spanlift.validation.cases;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/** Every reference case of {@code spanlift validate}, as one test each: a regression fails the build. */
class ReferenceCasesTest {

    @TestFactory
    Stream<DynamicTest> everyCasePasses() {
        return ReferenceCases.all().stream().map(c -> DynamicTest.dynamicTest(c.name(), () -> {
            CaseResult r = CaseRunner.run(c);
            assertTrue(r.pass(), () -> c.name() + ": " + c.quantity() + " = " + r.result() + " against " + c.reference()
                    + " (" + c.source() + "), error " + r.errorPct() + "% beyond " + c.tolerancePct() + "%");
        }));
    }

    @Test
    void namesAreUniqueAndEveryCaseNamesItsSource() {
        List<ReferenceCase> all = ReferenceCases.all();
        Set<String> names = new HashSet<>();
        for (ReferenceCase c : all) {
            assertTrue(names.add(c.name()), c.name());
            assertTrue(!c.source().isBlank() && !c.toleranceWhy().isBlank(), c.name());
        }
        assertTrue(all.size() >= 12);
    }

    /** Lifting-line theory and the lattice approach each other as the aspect ratio grows. */
    @Test
    void liftingLineGapShrinksWithAspectRatio() {
        for (String family : List.of("elliptic", "rect", "taper0.40")) {
            double previous = Double.POSITIVE_INFINITY;
            for (double ar : ReferenceCases.LIFTING_LINE_ASPECT_RATIOS) {
                String name = family + "-slope-A" + (int) ar;
                ReferenceCase c = ReferenceCases.named(name).orElseThrow();
                double gap = Math.abs(CaseRunner.run(c).errorPct());
                assertTrue(gap < previous, name + ": gap " + gap + "% not below " + previous + "%");
                previous = gap;
            }
        }
    }

    @Test
    void richardsonRecoversASecondOrderSequence() {
        double[] f = {1 + 1.0 / 16, 1 + 1.0 / 64, 1 + 1.0 / 256};
        assertEquals(2.0, Richardson.order(f).getAsDouble(), 1e-12);
        assertEquals(1.0, Richardson.extrapolate(f, 2.0), 1e-12);
        assertTrue(Richardson.order(new double[] {1, 2, 1.5}).isEmpty(), "not monotone");
        assertEquals(1.0, Richardson.extrapolated(f).getAsDouble(), 1e-12);
        double[] slow = {1 + 1.0, 1 + 0.9, 1 + 0.81};
        assertEquals(Math.log(1 / 0.9) / Math.log(2), Richardson.order(slow).getAsDouble(), 1e-12);
        assertTrue(Richardson.extrapolated(slow).isEmpty(), "order 0.15: not extrapolated");
    }
}
