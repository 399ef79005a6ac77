package org.spanlift.section;

import java.util.Locale;

/** Temporary: replaced by the section library. */
public final class CamberLines {
    private CamberLines() {
    }

    public static CamberLine parse(String spec) {
        String s = spec.trim().toUpperCase(Locale.ROOT).replace(" ", "");
        if (s.equals("FLAT")) {
            return naca4(0, 0, "flat");
        }
        if (s.matches("NACA\\d{4}")) {
            double m = (s.charAt(4) - '0') / 100.0;
            double p = (s.charAt(5) - '0') / 10.0;
            return naca4(m, p, spec);
        }
        throw new IllegalArgumentException("expected flat or NACA followed by 4 digits");
    }

    private static CamberLine naca4(double m, double p, String name) {
        return new CamberLine() {
            public double z(double x) {
                if (m == 0) {
                    return 0;
                }
                return x < p ? m / (p * p) * (2 * p * x - x * x) : m / ((1 - p) * (1 - p)) * (1 - 2 * p + 2 * p * x - x * x);
            }

            public double slope(double x) {
                if (m == 0) {
                    return 0;
                }
                return x < p ? 2 * m / (p * p) * (p - x) : 2 * m / ((1 - p) * (1 - p)) * (p - x);
            }

            public String designation() {
                return name;
            }
        };
    }
}
