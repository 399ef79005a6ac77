package org.spanlift.cli.plot;

import java.util.Arrays;
import java.util.Locale;

import org.spanlift.input.InputException;

/**
 * The plots of one wing, by the name {@code spanlift plot --what} takes. The id is the figure's id in SVG
 * and HTML.
 */
public enum PlotKind {
    PLANFORM("planform", "planform"),
    SPAN_LOAD("span-load", "span-load"),
    LIFT("lift", "lift-curve"),
    POLAR("polar", "polar"),
    STALL("stall", "stall-map");

    private final String cliName;
    private final String figureId;

    PlotKind(String cliName, String figureId) {
        this.cliName = cliName;
        this.figureId = figureId;
    }

    public String cliName() {
        return cliName;
    }

    /** The {@link Figure#id()} of this kind's figure. */
    public String figureId() {
        return figureId;
    }

    /** All names, for messages: {@code planform, span-load, lift, polar, stall}. */
    public static String names() {
        return String.join(", ", Arrays.stream(values()).map(PlotKind::cliName).toList());
    }

    public static PlotKind parse(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        for (PlotKind k : values()) {
            if (k.cliName.equals(t)) {
                return k;
            }
        }
        throw new InputException("--what", 0, "", "expected one of " + names() + ", got '" + text + "'");
    }
}
