package org.spanlift.solve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.ejml.data.DMatrixRMaj;
import org.junit.jupiter.api.Test;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.ControlSurface;
import org.spanlift.geometry.EllipticPlanform;
import org.spanlift.geometry.LatticeSpec;
import org.spanlift.geometry.LengthUnit;
import org.spanlift.geometry.Section;
import org.spanlift.geometry.Spacing;
import org.spanlift.geometry.Station;
import org.spanlift.geometry.StationPlanform;
import org.spanlift.geometry.Surface;
import org.spanlift.geometry.Trapezoid;
import org.spanlift.geometry.Wing;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;
import org.spanlift.section.CamberLines;

/**
 * The Rankine cores of the trailing legs: the law itself, that no wing alone ever feels them (its influence
 * matrices are those of potential legs, bit for bit), and what they do to the discrete sum of a vortex sheet.
 */
class TrailingCoreTest {

    private static final double DEG = Math.PI / 180;

    private static Wing wing(Surface... surfaces) {
        return new Wing("w", LengthUnit.M, Wing.defaultReference(surfaces[0]), List.of(surfaces),
                Map.of("s", Section.of("s", CamberLines.parse("flat"))));
    }

    private static LatticeSpec spec(int strips, int rows, Spacing spacing) {
        return new LatticeSpec(strips, rows, spacing, spacing);
    }

    /** Wings alone of every kind the lattice builder meets: sweep, taper, dihedral, controls, both spacings. */
    static List<Wing> wingsAlone() {
        List<ControlSurface> controls = List.of(
                new ControlSurface("flap", ControlKind.FLAP, 0.4, 2.1, 0.25, 0),
                new ControlSurface("aileron", ControlKind.AILERON, 2.1, 4.3, 0.22, 0));
        StationPlanform gull = new StationPlanform(List.of(
                new Station(0, 1.4, 0, 0, 0, "s"),
                new Station(1.2, 1.3, 0.05, -0.12, 0, "s"),
                new Station(4.0, 0.7, 0.4, 0.35, -2 * DEG, "s")));
        return List.of(
                wing(new Trapezoid(10, 1.6, 0.4, 30 * DEG, 0, 0, 0, "s", 0, 0).surface("swept", List.of(),
                        spec(24, 6, Spacing.COSINE))),
                wing(new Trapezoid(9, 1.3, 0.5, 5 * DEG, 6 * DEG, 2 * DEG, 3 * DEG, "s", 0, 0).surface("dihedral",
                        controls, spec(20, 6, Spacing.COSINE))),
                wing(new Trapezoid(9, 1.3, 0.5, 0, 3 * DEG, 0, 0, "s", 0, 0).surface("uniform", controls,
                        spec(17, 5, Spacing.UNIFORM))),
                wing(new Surface("elliptic", true, new EllipticPlanform(5, 1.2, 0, 0, 4 * DEG, 0, 0, "s"), List.of(),
                        spec(24, 4, Spacing.COSINE))),
                wing(new Surface("gull", true, gull, List.of(), spec(16, 4, Spacing.COSINE))),
                wing(new Surface("unmirrored", false, gull, List.of(), spec(12, 3, Spacing.COSINE))));
    }

    /** The matrix of potential trailing legs (no core), assembled in the influence system's order. */
    private static DMatrixRMaj potentialMatrix(Lattice lattice) {
        int n = lattice.panelCount();
        DMatrixRMaj a = new DMatrixRMaj(n, n);
        double[] trailing = new double[lattice.trailingPointCount()];
        double[] v = new double[3];
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < trailing.length; k++) {
                v[0] = 0;
                v[1] = 0;
                v[2] = 0;
                HorseshoeKernel.trailing(lattice.trailingX(k), lattice.trailingY(k), lattice.trailingZ(k),
                        lattice.cx(i), lattice.cy(i), lattice.cz(i), lattice.trailingCutoff(k), 0, 1, v);
                trailing[k] = v[1] * lattice.ny(i) + v[2] * lattice.nz(i);
            }
            for (int j = 0; j < n; j++) {
                v[0] = 0;
                v[1] = 0;
                v[2] = 0;
                HorseshoeKernel.segment(lattice.ax(j), lattice.ay(j), lattice.az(j), lattice.bx(j), lattice.by(j),
                        lattice.bz(j), lattice.cx(i), lattice.cy(i), lattice.cz(i), lattice.cutoff(j), v);
                a.data[i * n + j] = v[0] * lattice.nx(i) + v[1] * lattice.ny(i) + v[2] * lattice.nz(i)
                        + trailing[lattice.trailingPointB(j)] - trailing[lattice.trailingPointA(j)];
            }
        }
        return a;
    }

    @Test
    void aWingAloneHasTheInfluenceMatrixOfPotentialLegsExactly() {
        for (Wing w : wingsAlone()) {
            Lattice lattice = LatticeBuilder.build(w);
            DMatrixRMaj cored = InfluenceSystem.assemble(lattice, Symmetry.FULL);
            DMatrixRMaj potential = potentialMatrix(lattice);
            for (int e = 0; e < cored.data.length; e++) {
                assertEquals(potential.data[e], cored.data[e], 0.0, w.main().name() + ", entry " + e);
            }
        }
    }

    @Test
    void noControlPointOfALegsOwnSurfaceLiesInsideItsCore() {
        for (Wing w : wingsAlone()) {
            Lattice lattice = LatticeBuilder.build(w);
            for (int k = 0; k < lattice.trailingPointCount(); k++) {
                assertTrue(lattice.trailingCoreSquared(k) > 0, w.main().name());
                for (int i = 0; i < lattice.panelCount(); i++) {
                    double ry = lattice.cy(i) - lattice.trailingY(k);
                    double rz = lattice.cz(i) - lattice.trailingZ(k);
                    assertTrue(ry * ry + rz * rz >= lattice.trailingCoreSquared(k), w.main().name());
                }
            }
        }
    }

    @Test
    void theCoreIsHalfTheNarrowerStripOnARegularLattice() {
        // uniform strips of width 0.5 m: every core radius 0.25 m (0.125 m^2 would be the wrong square)
        Wing w = wing(new Trapezoid(6, 1, 1, 0, 0, 0, 0, "s", 0, 0).surface("w", List.of(),
                spec(6, 2, Spacing.UNIFORM)));
        Lattice lattice = LatticeBuilder.build(w);
        for (int k = 0; k < lattice.trailingPointCount(); k++) {
            assertEquals(0.0625, lattice.trailingCoreSquared(k), 1e-15);
        }
        // cosine strips: at an edge between strips of widths w1 > w2, the radius is w2 / 2; at the tip, the
        // last strip's control point (at its midpoint in angle) lies nearer than half its width and bounds it
        Wing c = wing(new Trapezoid(6, 1, 1, 0, 0, 0, 0, "s", 0, 0).surface("w", List.of(),
                spec(6, 1, Spacing.COSINE)));
        Lattice cl = LatticeBuilder.build(c);
        double[] edges = new double[7];
        for (int k = 0; k <= 6; k++) {
            edges[k] = 3 * Math.sin(0.5 * Math.PI * k / 6);
        }
        for (int k = 0; k < cl.trailingPointCount(); k++) {
            int e = (int) Math.round(6 * Math.asin(Math.min(1, Math.abs(cl.trailingY(k)) / 3)) / (0.5 * Math.PI));
            double expected = e == 0 ? 0.5 * edges[1] : e == 6 ? 3 - 3 * Math.sin(0.5 * Math.PI * 5.5 / 6)
                    : 0.5 * Math.min(edges[e] - edges[e - 1], edges[e + 1] - edges[e]);
            assertEquals(expected, Math.sqrt(cl.trailingCoreSquared(k)), 1e-12, "edge " + e);
        }
    }

    @Test
    void theKernelIsPotentialOutsideTheCoreAndSolidBodyInside() {
        double core2 = 0.04; // r_c = 0.2 m
        double[] potential = new double[3];
        double[] cored = new double[3];
        // outside and on the core: bit-identical to the potential leg
        for (double d : new double[] {0.2, 0.3, 2}) {
            potential[1] = potential[2] = cored[1] = cored[2] = 0;
            HorseshoeKernel.trailing(0, 0, 0, 0.7, d * 0.6, d * 0.8, 1e-9, 0, 1, potential);
            HorseshoeKernel.trailing(0, 0, 0, 0.7, d * 0.6, d * 0.8, 1e-9, core2, 1, cored);
            assertEquals(potential[1], cored[1], 0.0);
            assertEquals(potential[2], cored[2], 0.0);
        }
        // inside: the swirl grows linearly with the distance, and meets the potential value at r_c
        double far = 1e9; // 1 + cos -> 2: the two-dimensional vortex, swirl 1 / (2 pi d) outside
        for (double d : new double[] {0.01, 0.1, 0.19999}) {
            cored[1] = cored[2] = 0;
            HorseshoeKernel.trailing(0, 0, 0, far, d, 0, 1e-9, core2, 1, cored);
            assertEquals(d / (2 * Math.PI * core2), cored[2], 1e-12);
            assertEquals(0, cored[1], 0.0);
        }
        cored[2] = 0;
        HorseshoeKernel.trailing(0, 0, 0, far, 0.2, 0, 1e-9, core2, 1, cored);
        assertEquals(1 / (2 * Math.PI * 0.2), cored[2], 1e-12);
    }

    /**
     * A uniform vortex sheet of strength gamma along y, discretized as legs of strength gamma h at spacing h
     * (far downstream, so each leg is a two-dimensional vortex), against the continuous sheet, whose
     * normalwash in its own plane at y is (gamma / 2 pi) ln((L + y) / (L - y)) for the sheet on (-L, L).
     * Between legs the discrete sum of potential vortices departs from it by (gamma / 2) cot(pi t / h), t the
     * distance to the nearest leg: a sawtooth of order gamma that refinement does not shrink. With a Rankine
     * core of h / 2 the departure is gamma (cot(pi u) / 2 - 1 / (2 pi u) + 2 u / pi), u = t / h, whose
     * largest value is 0.0238 gamma near u = 0.31 (both from Euler's partial fractions
     * pi cot(pi u) = sum over j of 1 / (u - j), the sum of an infinite row of point vortices).
     */
    @Test
    void aCoreOfHalfTheSpacingNearlyRemovesTheSawtoothOfADiscreteSheet() {
        double gamma = 1;
        double h = 0.1;
        int m = 2000;
        double halfLength = (m + 0.5) * h;
        double far = 1e12;
        double worstCored = 0;
        for (int s = 1; s < 100; s++) {
            double u = s / 100.0; // the point at u h, between the legs at 0 and h
            double y = u * h;
            double sheet = gamma / (2 * Math.PI) * Math.log((halfLength + y) / (halfLength - y));
            double[] potential = new double[3];
            double[] cored = new double[3];
            for (int j = -m; j <= m; j++) {
                HorseshoeKernel.trailing(0, j * h, 0, far, y, 0, 1e-12, 0, gamma * h, potential);
                HorseshoeKernel.trailing(0, j * h, 0, far, y, 0, 1e-12, 0.25 * h * h, gamma * h, cored);
            }
            double w = Math.min(u, 1 - u); // distance to the nearest leg over h
            double expected = Math.signum(0.5 - u) * gamma
                    * (0.5 / Math.tan(Math.PI * w) - 1 / (2 * Math.PI * w) + 2 * w / Math.PI);
            assertEquals(0.5 * gamma / Math.tan(Math.PI * u), potential[2] - sheet, 1e-3 * gamma, "u = " + u);
            assertEquals(expected, cored[2] - sheet, 1e-3 * gamma, "u = " + u);
            worstCored = Math.max(worstCored, Math.abs(cored[2] - sheet));
        }
        // potential legs: 0.5 gamma at a quarter of the spacing (and without bound toward each leg)
        assertTrue(worstCored < 0.025 * gamma, "cored legs: " + worstCored);
    }
}
