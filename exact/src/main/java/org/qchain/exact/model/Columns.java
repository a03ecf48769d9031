package org.qchain.exact.model;

/**
 * Columns as the format page counts them: characters (Unicode code points), 1-based, so a character outside the
 * Basic Multilingual Plane (two Java chars) is one column. Linear: a text without surrogate pairs maps indexes
 * straight through; otherwise one prefix count over the text, built on first use, serves every lookup.
 */
final class Columns {
    private final String text;
    private final boolean pairs;
    private int[] lowBefore;

    private Columns(String text) {
        this.text = text;
        boolean any = false;
        for (int i = 0; i < text.length() && !any; i++) {
            any = Character.isSurrogate(text.charAt(i));
        }
        this.pairs = any;
    }

    /** The columns of {@code text} (a line, or a whole file whose lines start at known indexes). */
    static Columns of(String text) {
        return new Columns(text);
    }

    /**
     * The 1-based column of the char at {@code index} on the line that starts at {@code lineStart}.
     *
     * @param lineStart the index of the line's first char
     * @param index     the index of the char
     * @return the column
     */
    int column(int lineStart, int index) {
        if (!pairs) {
            return index - lineStart + 1;
        }
        if (lowBefore == null) {
            // lowBefore[k]: chars in [0, k) that are the second half of a surrogate pair
            int[] c = new int[text.length() + 1];
            for (int k = 0; k < text.length(); k++) {
                boolean second = k > 0 && Character.isLowSurrogate(text.charAt(k))
                    && Character.isHighSurrogate(text.charAt(k - 1));
                c[k + 1] = c[k] + (second ? 1 : 0);
            }
            lowBefore = c;
        }
        int end = Math.min(index, text.length());
        return (index - lineStart) - (lowBefore[end] - lowBefore[lineStart]) + 1;
    }

    /** The column of {@code index} on a single line. */
    int column(int index) {
        return column(0, index);
    }
}
