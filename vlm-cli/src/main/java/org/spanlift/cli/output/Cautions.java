package org.spanlift.cli.output;

/**
 * The cautions that outputs bearing on safety carry (stall speeds, maximum lift, loads), declared once so
 * every command says the same. They defer to the airworthiness standards and licensed engineering practice.
 */
public final class Cautions {

    /** Stall onset and stall speeds. */
    public static final String STALL = "Caution: an estimate from linear theory and section data for the wing alone "
            + "(the tail's download, which raises the real stall speed, is not included); not a substitute for "
            + "flight test, airworthiness standards or licensed engineering judgement.";

    /**
     * Stall onset and stall speeds of a wing file with other surfaces besides the wing: the configuration as
     * given, untrimmed.
     */
    public static final String STALL_UNTRIMMED = "Caution: an estimate from linear theory and section data for the "
            + "configuration untrimmed (without the trim load of the tail or canard, which changes the real stall "
            + "speed; a tail's download raises it): spanlift balance gives the trimmed stall speeds. Not a substitute "
            + "for flight test, airworthiness standards or licensed engineering judgement.";

    /** The stall caution for a wing file of {@code surfaces} surfaces: {@link #STALL} for a wing alone. */
    public static String stall(int surfaces) {
        return surfaces > 1 ? STALL_UNTRIMMED : STALL;
    }

    /** Spanwise loads. */
    public static final String LOADS = "Caution: loads for preliminary sizing only. Structural design and "
            + "substantiation follow the applicable airworthiness standards and licensed engineering practice, with "
            + "the required safety factors, which this tool does not apply unless told to (--safety-factor).";

    /** Stall results of a sweep. */
    public static final String SWEEP = "Caution: stall results are linear-theory estimates for the wing alone; they "
            + "inform design and do not replace flight test, airworthiness standards or licensed engineering "
            + "judgement.";

    /** Loads columns of a sweep (limit loads of one case, clean). */
    public static final String SWEEP_LOADS = "Caution: loads.* columns are limit loads of the wing alone for "
            + "preliminary sizing, without safety factors; structural design follows the applicable airworthiness "
            + "standards and licensed engineering practice.";

    /** A comparison that shows stall results, loads or both. */
    public static final String COMPARISON = "Caution: stall speeds and loads are linear-theory estimates for the wing "
            + "alone (without the tail's download, which raises the real stall speed); loads are limit loads without "
            + "safety factors. They inform design and defer to the applicable airworthiness standards, local rules "
            + "and licensed engineering practice.";

    /** The configuration in balance: neutral point, trim and trimmed stall speeds. */
    public static final String BALANCE = "Caution: linear theory for the configuration given (wake along the x axis, "
            + "tail efficiency 1, no propeller slipstream, out of ground effect; the forward limit of the centre of "
            + "gravity ignores ground effect, which needs more elevator in the landing flare). Stall points are power "
            + "off. Not a substitute for flight test, airworthiness standards, local rules or licensed engineering "
            + "judgement.";

    private Cautions() {
    }
}
