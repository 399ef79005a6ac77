package org.spanlift.section;

/** The flat plate (no camber): z = 0 and slope 0 everywhere. */
public final class FlatPlate implements CamberLine {

    /** The single instance; its designation is {@code flat}. */
    public static final FlatPlate INSTANCE = new FlatPlate();

    private FlatPlate() {
    }

    @Override
    public double z(double x) {
        return 0.0;
    }

    @Override
    public double slope(double x) {
        return 0.0;
    }

    @Override
    public String designation() {
        return "flat";
    }

    @Override
    public String toString() {
        return designation();
    }
}
