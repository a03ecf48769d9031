package org.qchain.format;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.qchain.exact.ErrorKey;
import org.qchain.exact.QchainException;
import org.qchain.exact.Rational;
import org.qchain.result.StepResult;

/**
 * Streamed output ({@link Formatter#write}) is the text of {@link Formatter#format}, character for character, in
 * every format and with several chunks, helper threads and shared denominators; and exact texts equal
 * {@link Rational#toString()} (the reference: the value's own text; common practice, no source).
 */
class StreamedOutputTest {

    /** A random matrix of long fractions; many entries share a denominator, as the reduced entries of a power do. */
    private static List<List<Rational>> entries(Random rnd, int size, int bits) {
        BigInteger[] dens = new BigInteger[3];
        for (int k = 0; k < dens.length; k++) {
            dens[k] = new BigInteger(bits, rnd).setBit(bits - 1);
        }
        List<List<Rational>> rows = new ArrayList<>();
        for (int i = 0; i < size; i++) {
            List<Rational> row = new ArrayList<>();
            for (int j = 0; j < size; j++) {
                BigInteger d = dens[rnd.nextInt(dens.length)];
                row.add(rnd.nextInt(9) == 0 ? Rational.ZERO : Rational.of(new BigInteger(bits - 1, rnd), d));
            }
            rows.add(row);
        }
        return rows;
    }

    // fixed seeds: sizes 1 to 14, entries of 200 to 8,200 bits
    @Test
    void streamedTextEqualsTheWholeText() throws IOException {
        Random seeds = new Random(4711);
        for (int t = 0; t < 6; t++) {
            int size = 1 + seeds.nextInt(14);
            streamedTextEqualsTheWholeText(new Random(seeds.nextLong()), size);
        }
    }

    private static void streamedTextEqualsTheWholeText(Random rnd, int size) throws IOException {
        List<List<Rational>> rows = entries(rnd, size, 200 + rnd.nextInt(8_000));
        List<String> states = new ArrayList<>();
        for (int i = 0; i < size; i++) {
            states.add("S" + i);
        }
        StepResult.Header h = new StepResult.Header("m.chain", "discrete", 7, List.of());
        StepResult.Matrix m = new StepResult.Matrix(h, states, rows);
        StepResult.Row row = new StepResult.Row(h, "S0", states, rows.get(0));
        for (OutputFormat f : OutputFormat.values()) {
            for (boolean doubles : new boolean[] {false, true}) {
                if (doubles && f != OutputFormat.JSON && f != OutputFormat.CSV) {
                    continue;
                }
                Formatter fm = f.formatter(12, doubles);
                for (StepResult r : List.of(m, row)) {
                    String whole = fm.format(r);
                    StringBuilder out = new StringBuilder();
                    AtomicInteger pieces = new AtomicInteger();
                    fm.write(r, new Appendable() {
                        @Override
                        public Appendable append(CharSequence cs) {
                            pieces.incrementAndGet();
                            return out.append(cs);
                        }

                        @Override
                        public Appendable append(CharSequence cs, int start, int end) {
                            return append(cs.subSequence(start, end));
                        }

                        @Override
                        public Appendable append(char c) {
                            return append(String.valueOf(c));
                        }
                    });
                    assertEquals(whole, out.toString(), f + " " + r.getClass().getSimpleName());
                    if (whole.length() > 4 * Sink.CHUNK && f != OutputFormat.MARKDOWN && f != OutputFormat.LATEX) {
                        assertTrue(pieces.get() > 1, "written in pieces: " + f);
                    }
                }
            }
        }
    }

    @Test
    void exactTextsAreTheValuesOwnTexts() {
        Random rnd = new Random(1234);
        for (int t = 0; t < 20; t++) {
            exactTextsAreTheValuesOwnTexts(rnd);
        }
    }

    private static void exactTextsAreTheValuesOwnTexts(Random rnd) {
        List<Rational> values = new ArrayList<>();
        entries(rnd, 8, 64 + rnd.nextInt(5000)).forEach(values::addAll);
        values.add(Rational.of(-3, 7));
        values.add(Rational.of(5));
        try (AheadTexts t = AheadTexts.exact(values)) {
            for (int i = 0; i < values.size(); i++) {
                assertEquals(values.get(i).toString(), t.get(i));
            }
        }
    }

    // a failing conversion reaches the writer, at its entry
    @Test
    void aFailureOfAConversionIsThrownAtItsEntry() {
        for (int bad : new int[] {0, 17, 60}) {
            failureAt(bad);
        }
    }

    private static void failureAt(int bad) {
        List<Rational> values = new ArrayList<>();
        for (int i = 0; i < 61; i++) {
            values.add(Rational.of(i));
        }
        try (AheadTexts t = AheadTexts.start(values, r -> {
            if (r.equals(Rational.of(bad))) {
                throw new ArithmeticException("entry " + bad);
            }
            return r.toString();
        })) {
            for (int i = 0; i < bad; i++) {
                assertEquals(String.valueOf(i), t.get(i));
            }
            assertEquals("entry " + bad, assertThrows(ArithmeticException.class, () -> t.get(bad)).getMessage());
        }
    }

    // Ctrl-C interrupts the writing thread: the next entry stops it with the interrupt's message key
    @Test
    void anInterruptStopsTheWriterBetweenEntries() {
        List<Rational> values = new ArrayList<>();
        for (int i = 0; i < 100; i++) {
            values.add(Rational.of(i, 7));
        }
        try (AheadTexts t = AheadTexts.exact(values)) {
            assertEquals("0", t.get(0));
            assertEquals("1/7", t.get(1));
            Thread.currentThread().interrupt();
            QchainException e = assertThrows(QchainException.class, () -> t.get(2));
            assertEquals(ErrorKey.INTERRUPTED, e.key());
        } finally {
            Thread.interrupted();
        }
    }
}
