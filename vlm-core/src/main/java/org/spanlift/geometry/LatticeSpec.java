package org.spanlift.geometry;

/**
 * The lattice density of one surface: spanwise strips (on the described half of a mirrored surface, on
 * the whole surface otherwise) and chordwise rows (panels per strip), with the spacing of each.
 *
 * @param strips       spanwise strips
 * @param rows         chordwise rows (panels per strip)
 * @param stripSpacing spacing of the strips
 * @param rowSpacing   spacing of the rows
 */
public record LatticeSpec(int strips, int rows, Spacing stripSpacing, Spacing rowSpacing) {

    /** What a surface gets when its file gives no lattice. */
    public static final LatticeSpec DEFAULT = new LatticeSpec(32, 8, Spacing.COSINE, Spacing.COSINE);

    /** Checks that there is at least one strip and one row. */
    public LatticeSpec {
        if (strips < 1 || rows < 1) {
            throw new IllegalArgumentException("a lattice needs at least one strip and one row");
        }
    }
}
