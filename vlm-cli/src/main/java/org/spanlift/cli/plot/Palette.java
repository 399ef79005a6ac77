package org.spanlift.cli.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;

import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Spanlift's drawing style: the eight-colour palette of Okabe and Ito (2008), chosen because it stays
 * distinguishable under the common forms of colour-vision deficiency, and a line style and marker for
 * every series so that a grey-scale print or a reader who cannot tell the colours apart still can tell
 * the series apart. Yellow is left out of lines (too faint on white paper).
 */
public final class Palette {

    public static final Color INK = new Color(0x1A, 0x1A, 0x1A);
    public static final Color MUTED = new Color(0x5C, 0x5C, 0x5C);
    public static final Color GRID = new Color(0xE2, 0xE2, 0xE2);
    public static final Color LATTICE = new Color(0xA8, 0xA8, 0xA8);
    public static final Color PAPER = Color.WHITE;

    public static final Color BLUE = new Color(0x00, 0x72, 0xB2);
    public static final Color VERMILLION = new Color(0xD5, 0x5E, 0x00);
    public static final Color GREEN = new Color(0x00, 0x9E, 0x73);
    public static final Color PURPLE = new Color(0xCC, 0x79, 0xA7);
    public static final Color ORANGE = new Color(0xE6, 0x9F, 0x00);
    public static final Color SKY = new Color(0x56, 0xB4, 0xE9);

    /** Flap shading: a light tint of sky blue with blue hatching. */
    public static final Color FLAP_FILL = tint(SKY, 0.32);
    public static final Color FLAP_LINE = BLUE;
    /** Aileron shading: a light tint of orange with vermillion hatching. */
    public static final Color AILERON_FILL = tint(ORANGE, 0.30);
    /** The fuselage band of the stall map: a light neutral grey. */
    public static final Color FUSELAGE_FILL = tint(INK, 0.12);
    public static final Color AILERON_LINE = VERMILLION;

    private static final Color[] SERIES = {BLUE, VERMILLION, GREEN, PURPLE, ORANGE, SKY, INK};

    private static final float[][] DASHES = {null, {7f, 4f}, {1.5f, 3.5f}, {9f, 3f, 1.5f, 3f}, {3.5f, 3.5f},
        {12f, 4f}, {1.5f, 2f}};

    private static final Marker[] MARKERS = {SeriesMarkers.CIRCLE, SeriesMarkers.SQUARE, SeriesMarkers.DIAMOND,
        SeriesMarkers.TRIANGLE_UP, SeriesMarkers.TRIANGLE_DOWN, SeriesMarkers.CROSS, SeriesMarkers.PLUS};

    /** The font family of every figure: Java's logical sans-serif (DejaVu Sans on Debian). */
    public static final String FAMILY = Font.SANS_SERIF;

    /**
     * The font stack of SVG text: the font Java lays the figures out with on Debian first, then the common
     * sans-serif fonts of other systems, whose widths are close.
     */
    public static final String SVG_FONT_FAMILY = "DejaVu Sans, Arial, Helvetica, sans-serif";

    private Palette() {
    }

    /** The colour of the i-th compared or plotted series (cycling). */
    public static Color series(int i) {
        return SERIES[Math.floorMod(i, SERIES.length)];
    }

    /** The line stroke of the i-th series: solid, dashed, dotted, dash-dot, ... (cycling). */
    public static BasicStroke line(int i, float width) {
        float[] dash = DASHES[Math.floorMod(i, DASHES.length)];
        return dash == null ? new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND)
                : new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, scale(dash, width / 1.6f),
                        0f);
    }

    /** The marker of the i-th series (cycling). */
    public static Marker marker(int i) {
        return MARKERS[Math.floorMod(i, MARKERS.length)];
    }

    /** A theory or reference curve: thin, dark grey, long dashes, never a marker. */
    public static BasicStroke referenceLine() {
        return new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, new float[] {10f, 5f}, 0f);
    }

    public static Font font(int style, float size) {
        return new Font(FAMILY, style, 12).deriveFont(size);
    }

    /** The colour mixed with white: {@code amount} 0 gives white, 1 the colour itself. */
    static Color tint(Color c, double amount) {
        return new Color(mix(c.getRed(), amount), mix(c.getGreen(), amount), mix(c.getBlue(), amount));
    }

    private static int mix(int channel, double amount) {
        return (int) Math.round(255 - (255 - channel) * amount);
    }

    private static float[] scale(float[] dash, float k) {
        float[] out = dash.clone();
        for (int i = 0; i < out.length; i++) {
            out[i] *= Math.max(1f, k);
        }
        return out;
    }
}
