package org.spanlift.sweep;

import org.spanlift.batch.CaseResult;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.spanlift.io.WingSchema;

class DesignTest {

    private static Parameter range(String path, String from, String to, String step) {
        return Parameter.ofRange(ParameterPath.parse(path, WingSchema.ROOT), 1, new BigDecimal(from),
                new BigDecimal(to),
                step == null ? null : new BigDecimal(step));
    }

    @Test
    void rangesIncludeTheirEndPointOnTheGrid() {
        Parameter taper = range("surfaces.wing.trapezoid.taper", "0.4", "1.0", "0.1");
        assertEquals(7, taper.gridCount());
        List<String> v = new ArrayList<>();
        for (int i = 0; i < 7; i++) {
            v.add(taper.gridValue(i));
        }
        assertEquals(List.of("0.4", "0.5", "0.6", "0.7", "0.8", "0.9", "1"), v);
        assertEquals(9, range("surfaces.wing.trapezoid.washout", "0", "4", "0.5").gridCount());
        assertEquals(4, range("surfaces.wing.trapezoid.washout", "0", "1", "0.3").gridCount());
        assertEquals(4, range("surfaces.wing.trapezoid.washout", "3", "0", "-1").gridCount());
        assertEquals(1, range("surfaces.wing.trapezoid.washout", "2", "2", "1").gridCount());
    }

    @Test
    void theGridRunsTheLastParameterFastest() {
        Design d = Design.grid(List.of(range("surfaces.wing.trapezoid.taper", "0.4", "0.6", "0.1"),
                Parameter.ofList(ParameterPath.parse("surfaces.wing.trapezoid.washout", WingSchema.ROOT), 1,
                        List.of("0", "2"))));
        assertEquals(6, d.count());
        assertArrayEquals(new String[] {"0.4", "0"}, d.values(0));
        assertArrayEquals(new String[] {"0.4", "2"}, d.values(1));
        assertArrayEquals(new String[] {"0.6", "2"}, d.values(5));
    }

    @Test
    void aLatinHypercubeUsesEveryStratumOnceAndIsReproducible() {
        List<Parameter> ps = List.of(range("surfaces.wing.trapezoid.taper", "0", "1", null),
                range("surfaces.wing.trapezoid.washout", "0", "10", null));
        int n = 37;
        Design a = Design.latinHypercube(ps, n, 42);
        Design b = Design.latinHypercube(ps, n, 42);
        for (int p = 0; p < 2; p++) {
            Set<Integer> strata = new HashSet<>();
            double width = p == 0 ? 1.0 / n : 10.0 / n;
            for (int i = 0; i < n; i++) {
                strata.add((int) Math.floor(Double.parseDouble(a.values(i)[p]) / width));
            }
            assertEquals(n, strata.size(), "parameter " + p);
        }
        boolean differs = false;
        Design c = Design.latinHypercube(ps, n, 43);
        for (int i = 0; i < n; i++) {
            assertArrayEquals(a.values(i), b.values(i));
            differs |= !a.values(i)[0].equals(c.values(i)[0]);
        }
        assertTrue(differs, "another seed gives other cases");
    }

    @Test
    void thePermutationIsABijectionForAwkwardSizes() {
        for (int n : new int[] {1, 2, 3, 5, 64, 65, 1000}) {
            Design.LatinHypercube d = new Design.LatinHypercube(List.of(range("surfaces.wing.trapezoid.taper", "0", "1",
                    null)), n, -7);
            Set<Long> seen = new HashSet<>();
            for (long i = 0; i < n; i++) {
                long s = d.permute(0, i);
                assertTrue(s >= 0 && s < n);
                seen.add(s);
            }
            assertEquals(n, seen.size());
        }
    }

    @Test
    void caseIdsDependOnTheValuesAlone() {
        List<Parameter> ps = List.of(range("surfaces.wing.trapezoid.taper", "0.4", "1.0", "0.1"));
        String id = CaseResult.id(ps, new String[] {"0.5"});
        assertEquals(CaseResult.ID_LENGTH, id.length());
        assertEquals(id, CaseResult.id(ps, new String[] {"0.5"}));
        assertNotEquals(id, CaseResult.id(ps, new String[] {"0.6"}));
    }
}
