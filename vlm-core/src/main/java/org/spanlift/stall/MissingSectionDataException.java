package org.spanlift.stall;

import org.spanlift.input.RefusedException;
import java.util.List;

/** Stall results were asked for, but some sections give no cl_max and no default was allowed. */
public final class MissingSectionDataException extends RefusedException {

    private static final long serialVersionUID = 1L;

    /** The sections without cl_max. */
    private final List<String> sections;

    /** The refusal naming the sections without cl_max. */
    public MissingSectionDataException(List<String> sections) {
        super("section" + (sections.size() > 1 ? "s " : " ") + String.join(", ", sections)
                + (sections.size() > 1 ? " give" : " gives") + " no cl-max; add cl-max to the section data, or allow "
                + "the conservative default with --assume-cl-max");
        this.sections = List.copyOf(sections);
    }

    /** The names of the sections without cl_max. */
    public List<String> sections() {
        return sections;
    }
}
