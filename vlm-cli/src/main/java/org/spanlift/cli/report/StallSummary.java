package org.spanlift.cli.report;

import java.util.Optional;

import org.spanlift.stall.StallSpeed;
import org.spanlift.stall.StallEstimate;

/**
 * The stall results a report shows: the onset estimate and, with a flight condition, the stall speed; or
 * why there are none (sections without cl-max data).
 */
public record StallSummary(Optional<StallEstimate> estimate, Optional<StallSpeed> speed, String unavailable) {

    public static StallSummary of(StallEstimate estimate, Optional<StallSpeed> speed) {
        return new StallSummary(Optional.of(estimate), speed, "");
    }

    public static StallSummary unavailable(String reason) {
        return new StallSummary(Optional.empty(), Optional.empty(), reason);
    }
}
