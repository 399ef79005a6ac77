package org.spanlift.cli.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.spanlift.geometry.ControlKind;
import org.spanlift.geometry.Planform;
import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;
import org.spanlift.lattice.Lattice;
import org.spanlift.lattice.LatticeBuilder;

class WingGeometryTest {

    private static Wing demo(String name) {
        return WingFileReader.read(Path.of("..", "geometries", name));
    }

    @Test
    void panelsTileTheChordFromLeadingToTrailingEdge() {
        Wing wing = demo("trainer.wing.yaml");
        Lattice lattice = LatticeBuilder.build(wing);
        List<WingGeometry.Panel> panels = WingGeometry.panels(wing, lattice);
        assertEquals(lattice.panelCount(), panels.size());
        Planform p = wing.main().planform();
        int rows = wing.main().lattice().rows();
        for (int i = 0; i < panels.size(); i += rows) {
            WingGeometry.Panel last = panels.get(i + rows - 1);
            double yl = Math.abs(last.ys()[3]);
            double yr = Math.abs(last.ys()[2]);
            assertEquals(p.noseX(yl) + p.chord(yl), last.xs()[3], 1e-9, "trailing edge at y = " + yl);
            assertEquals(p.noseX(yr) + p.chord(yr), last.xs()[2], 1e-9, "trailing edge at y = " + yr);
        }
    }

    @Test
    void controlPanelsLieWithinTheirControlsSpan() {
        Wing wing = demo("trainer.wing.yaml");
        List<WingGeometry.Panel> panels = WingGeometry.panels(wing, LatticeBuilder.build(wing));
        int flap = 0;
        int aileron = 0;
        for (WingGeometry.Panel p : panels) {
            if (p.control() < 0) {
                assertNull(p.kind());
                continue;
            }
            var c = wing.controls().get(p.control());
            double mid = Math.abs(0.5 * (p.ys()[0] + p.ys()[1]));
            assertTrue(mid > c.from() && mid < c.to(), c.name() + " panel at y = " + mid);
            if (p.kind() == ControlKind.FLAP) {
                flap++;
            } else {
                aileron++;
            }
        }
        assertTrue(flap > 0 && aileron > 0);
    }

    @Test
    void outlineCoversBothHalvesOfAMirroredWing() {
        Wing wing = demo("sailplane.wing.yaml");
        WingGeometry.Outline o = WingGeometry.outlines(wing).get(0);
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double y : o.ys()) {
            min = Math.min(min, y);
            max = Math.max(max, y);
        }
        assertEquals(-7.5, min, 1e-9);
        assertEquals(7.5, max, 1e-9);
    }

    @Test
    void niceScaleBarLengths() {
        assertEquals(1, PlanformFigure.nice(1.96), 1e-12);
        assertEquals(2, PlanformFigure.nice(3.0), 1e-12);
        assertEquals(5, PlanformFigure.nice(6.8), 1e-12);
        assertEquals(0.5, PlanformFigure.nice(0.7), 1e-12);
    }
}
