package org.spanlift.sweep;

/**
 * The ranked summary: the best {@code keep} successful cases that meet every constraint, by one column,
 * highest first ({@code max}) or lowest first ({@code min}); ties keep case order.
 */
public record Ranking(String by, boolean highestFirst, int keep) {

    public static final int DEFAULT_KEEP = 10;
    public static final int MAX_KEEP = 100_000;
}
