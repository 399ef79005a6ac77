package org.spanlift.solve;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.spanlift.input.RefusedException;

/** A lattice too large for the heap is refused before assembly, with the estimate and the limit. */
class SolveBudgetTest {

    @Test
    void aSystemThatCannotFitIsRefusedWithTheEstimateAndTheLimit() {
        // 2 x 8 bytes x n^2 with n = 2,000,000 is 64 TB: no test heap holds it
        RefusedException e = assertThrows(RefusedException.class, () -> SolveBudget.require(2_000_000, 2));
        String m = e.getMessage();
        assertTrue(m.contains("2000000 unknowns") && m.contains("needs about") && m.contains("at most")
                && m.contains("-Xmx"), m);
    }

    @Test
    void aDefaultLatticeFits() {
        assertDoesNotThrow(() -> SolveBudget.require(256, 2));
    }
}
