package org.spanlift.geometry;

/**
 * Linear interpolation between two named sections: a property is (1 - weight) of the inner section's plus
 * weight of the outer one's.
 */
public record SectionBlend(String inner, String outer, double weight) {

    public static SectionBlend of(String name) {
        return new SectionBlend(name, name, 0);
    }
}
