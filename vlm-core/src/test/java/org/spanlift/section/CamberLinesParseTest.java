package org.spanlift.section;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class CamberLinesParseTest {

    @Test
    void acceptsTheDocumentedSpellings() {
        assertSame(FlatPlate.INSTANCE, CamberLines.parse("flat"));
        assertSame(FlatPlate.INSTANCE, CamberLines.parse("  FLAT "));
        assertEquals(new NacaFourDigit(2, 4, 12), CamberLines.parse("NACA 2412"));
        assertEquals(new NacaFourDigit(2, 4, 12), CamberLines.parse("NACA2412"));
        assertEquals(new NacaFourDigit(2, 4, 12), CamberLines.parse("naca   2412"));
        assertEquals(new NacaFiveDigit(3, 12), CamberLines.parse("naca 23012"));
        assertEquals(new NacaFiveDigit(1, 15), CamberLines.parse("NACA21015"));
        assertInstanceOf(NacaFourDigit.class, CamberLines.parse("NACA 0012"));
        assertEquals("NACA 25012", CamberLines.parse("naca25012").designation());
    }

    private static String refusal(String spec) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> CamberLines.parse(spec));
        String message = e.getMessage();
        assertFalse(message.contains("\n"), "one line: " + message);
        assertTrue(message.contains("accepted: flat, NACA MPTT"), "says what is accepted: " + message);
        return message;
    }

    @Test
    void refusesOthersWithAOneLineMessageSayingWhatIsAccepted() {
        assertTrue(refusal("clark y").contains("'clark y': unknown camber line"));
        assertTrue(refusal("NACA 241").contains("four or five digits, found 3"));
        assertTrue(refusal("NACA 241x").contains("followed by four or five digits"));
        assertTrue(refusal("NACA 641-212").contains("followed by four or five digits"));
        assertTrue(refusal("NACA 44012").contains("design lift digit 4"));
        assertTrue(refusal("NACA 23112").contains("reflexed"));
        assertTrue(refusal("NACA 26012").contains("accepted are 210, 220, 230, 240, 250"));
        assertTrue(refusal("NACA 20012").contains("210, 220, 230, 240, 250"));
        assertTrue(refusal("NACA 2012").contains("camber-position digit 1 to 9"));
        assertTrue(refusal("NACA 0412").contains("camber-position digit 0"));
        assertTrue(refusal("NACA 2400").contains("thickness"));
        assertTrue(refusal("").contains("camber line missing"));
        assertTrue(refusal("NACA").contains("four or five digits"));
    }
}
