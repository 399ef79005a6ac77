package org.spanlift.validation.loads;

import org.spanlift.geometry.Wing;
import org.spanlift.io.WingFileReader;

/** Wings for the loads checks, written inline (invented test wings). */
final class LoadsFixtures {

    private LoadsFixtures() {
    }

    static Wing elliptic(double span, double rootChord, int strips) {
        return WingFileReader.parse("name: elliptic\nunits: m\nsurfaces:\n  - name: wing\n    elliptic: {span: " + span
                + ", root-chord: " + rootChord + "}\n    lattice: {strips: " + strips + ", rows: 4}\n",
                "elliptic.wing.yaml");
    }

    static Wing trapezoid(double span, double rootChord, double taper, int strips) {
        return WingFileReader.parse("name: tapered\nunits: m\nsurfaces:\n  - name: wing\n    trapezoid: {span: " + span
                + ", root-chord: " + rootChord + ", taper: " + taper + "}\n    lattice: {strips: " + strips
                + ", rows: 4}\n", "tapered.wing.yaml");
    }
}
