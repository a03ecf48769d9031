package org.qchain.format;

/** The safety caution that every help text and every report carries. */
public final class Caution {
    /** One sentence, no line break. */
    public static final String TEXT = "Caution: results are only as good as the model; safety-critical use follows"
        + " the applicable standards, local codes and licensed engineering review.";

    private Caution() {
    }

    /**
     * The caution broken into lines of at most {@code width} characters at spaces.
     *
     * @param width the longest line, at least the longest word
     * @return the lines joined by line breaks, without a final one
     */
    public static String wrapped(int width) {
        StringBuilder out = new StringBuilder();
        int lineStart = 0;
        for (String word : TEXT.split(" ")) {
            if (out.length() > lineStart && out.length() - lineStart + 1 + word.length() > width) {
                out.append('\n');
                lineStart = out.length();
            } else if (out.length() > lineStart) {
                out.append(' ');
            }
            out.append(word);
        }
        return out.toString();
    }
}
