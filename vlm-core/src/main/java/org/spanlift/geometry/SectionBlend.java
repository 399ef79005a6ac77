package org.spanlift.geometry;

/**
 * Linear interpolation between two named sections: a property is (1 - weight) of the inner section's plus
 * weight of the outer one's.
 *
 * @param inner  the inner section's name
 * @param outer  the outer section's name
 * @param weight the outer section's weight, 0 to 1
 */
public record SectionBlend(String inner, String outer, double weight) {

    /** The blend of one section alone (weight 0). */
    public static SectionBlend of(String name) {
        return new SectionBlend(name, name, 0);
    }
}
