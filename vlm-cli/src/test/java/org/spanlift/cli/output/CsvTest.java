package org.spanlift.cli.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;

/** RFC 4180 cells: what needs quotes gets them, and the reader gives back what was written. */
class CsvTest {

    @Test
    void aCarriageReturnALineFeedACommaOrAQuoteIsQuotedAndNothingElse() {
        assertEquals("\"a\rb\"", Csv.text("a\rb"));
        assertEquals("\"a\nb\"", Csv.text("a\nb"));
        assertEquals("\"a,b\"", Csv.text("a,b"));
        assertEquals("\"say \"\"hi\"\"\"", Csv.text("say \"hi\""));
        assertEquals("plain words; and more", Csv.text("plain words; and more"));
        assertEquals("", Csv.text(""));
    }

    @Test
    void recordsWrittenByTheWriterReadBackCellForCell() {
        List<Object> awkward = List.of("a\rb", "c,d", "e\"f", "g\nh", "i\r\nj", "", "plain");
        String text = new Csv(List.of("one", "two", "three", "four", "five", "six", "seven")).row(awkward.toArray())
                .row(1.5, "x", "y", "z", "w", "v", "u").toString();
        List<List<String>> records = Csv.records(text);
        assertEquals(3, records.size());
        assertEquals(awkward, List.copyOf(records.get(1)));
        assertEquals(List.of("1.5", "x", "y", "z", "w", "v", "u"), records.get(2));
        assertEquals(List.of(List.of("a", "b"), List.of("c", "d")), Csv.records("a,b\r\nc,d\r\n"));
    }

    @Test
    void malformedQuotingIsRefusedNotGuessed() {
        assertThrows(IllegalArgumentException.class, () -> Csv.cells("\"open,cell"));
        assertThrows(IllegalArgumentException.class, () -> Csv.cells("\"closed\"text,b"));
        assertThrows(IllegalArgumentException.class, () -> Csv.cells("in\"side,b"));
    }
}
