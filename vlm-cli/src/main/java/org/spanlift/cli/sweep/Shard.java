package org.spanlift.cli.sweep;

import java.math.BigInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.spanlift.input.InputException;

/**
 * The i-th of n disjoint slices of a design (i from 1 to n): cases {@code floor(N (i-1) / n)} up to, not
 * including, {@code floor(N i / n)}, so the slices are contiguous, in case order, and together cover
 * every case once.
 */
public record Shard(int index, int count) {

    private static final Pattern FORM = Pattern.compile("\\s*(\\d{1,6})\\s*/\\s*(\\d{1,6})\\s*");

    /** The whole design. */
    public static final Shard ALL = new Shard(1, 1);

    public static Shard parse(String text) {
        Matcher m = FORM.matcher(text);
        if (!m.matches()) {
            throw new InputException("--shard", 0, "", "expected i/n with 1 <= i <= n (such as 2/4), got '" + text
                    + "'");
        }
        int i = Integer.parseInt(m.group(1));
        int n = Integer.parseInt(m.group(2));
        if (n < 1 || i < 1 || i > n) {
            throw new InputException("--shard", 0, "", "expected i/n with 1 <= i <= n (such as 2/4), got '" + text
                    + "'");
        }
        return new Shard(i, n);
    }

    public long first(long cases) {
        return bound(cases, index - 1);
    }

    public long end(long cases) {
        return bound(cases, index);
    }

    private long bound(long cases, int k) {
        return BigInteger.valueOf(cases).multiply(BigInteger.valueOf(k)).divide(BigInteger.valueOf(count))
                .longValueExact();
    }

    public boolean whole() {
        return count == 1;
    }

    @Override
    public String toString() {
        return index + "/" + count;
    }
}
