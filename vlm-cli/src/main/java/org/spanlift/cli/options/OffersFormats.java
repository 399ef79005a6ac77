package org.spanlift.cli.options;

import java.util.Set;

/**
 * A command that writes a fixed set of output formats. The set serves both the check of {@code --format} and
 * its help text, which lists only these.
 */
public interface OffersFormats {

    /** The formats the command writes. */
    Set<Format> formats();
}
