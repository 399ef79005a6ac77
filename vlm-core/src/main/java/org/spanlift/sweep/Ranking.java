package org.spanlift.sweep;

/**
 * The ranked summary: the best {@code keep} successful cases that meet every constraint, by one column,
 * highest first ({@code max}) or lowest first ({@code min}); ties keep case order.
 *
 * @param by           the column ranked by
 * @param highestFirst true for {@code max}, false for {@code min}
 * @param keep         how many cases are kept
 */
public record Ranking(String by, boolean highestFirst, int keep) {

    /** The number of cases kept when the sweep file gives no {@code keep}. */
    public static final int DEFAULT_KEEP = 10;
    /** The largest {@code keep} accepted. */
    public static final int MAX_KEEP = 100_000;
}
