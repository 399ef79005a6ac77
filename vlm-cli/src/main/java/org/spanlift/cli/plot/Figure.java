package org.spanlift.cli.plot;

import java.awt.Graphics2D;

/**
 * One drawing of a fixed size in pixels, painted with Java2D onto any {@link Graphics2D}: Batik's SVG
 * generator for vector output, a bitmap for PNG.
 */
public interface Figure {

    /** A short name, lower case and hyphenated; it prefixes every id in the SVG so figures can share a page. */
    String id();

    /** A one-line title, also the SVG's {@code <title>} for screen readers. */
    String title();

    /** A sentence or two saying what the figure shows (the SVG's {@code <desc>}). */
    String description();

    int width();

    int height();

    /** Paints the whole figure, background included, in the rectangle (0, 0, width, height). */
    void paint(Graphics2D g);
}
