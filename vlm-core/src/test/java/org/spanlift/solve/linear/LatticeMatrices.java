package org.spanlift.solve.linear;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.spanlift.io.WingFileReader;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;
import org.spanlift.solve.InfluenceSystem;
import org.spanlift.solve.Symmetry;

/** Influence matrices of real lattices for the solver tests: the demo trainer and a swept, tapered wing. */
final class LatticeMatrices {

    /** A named row-major square matrix with a right-hand side of the kind the engine solves. */
    record Case(String name, int n, double[] a, double[] b) {
    }

    private LatticeMatrices() {
    }

    static List<Case> all() {
        List<Case> cases = new ArrayList<>();
        Lattice trainer = LatticeBuilder.build(WingFileReader.read(Path.of("../geometries/trainer.wing.yaml")));
        for (Symmetry s : Symmetry.values()) {
            cases.add(of("trainer " + s, trainer, s));
        }
        String yaml = """
                name: Swept trapezoid
                units: m
                surfaces:
                  - name: wing
                    trapezoid: {span: 10.0, root-chord: 1.6, taper: 0.4, sweep: 20, dihedral: 4, washout: 2}
                    lattice: {strips: 23, rows: 7, strip-spacing: cosine, row-spacing: uniform}
                """;
        Lattice swept = LatticeBuilder.build(WingFileReader.parse(yaml, "swept.wing.yaml"));
        cases.add(of("swept SYMMETRIC", swept, Symmetry.SYMMETRIC));
        cases.add(of("swept ANTISYMMETRIC", swept, Symmetry.ANTISYMMETRIC));
        return cases;
    }

    private static Case of(String name, Lattice lattice, Symmetry symmetry) {
        double[] a = InfluenceSystem.assemble(lattice, symmetry).data;
        int n = (int) Math.round(Math.sqrt(a.length));
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = -lattice.nz(i); // a unit freestream along z
        }
        return new Case(name, n, a, b);
    }
}
