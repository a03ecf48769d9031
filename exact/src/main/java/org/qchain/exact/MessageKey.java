package org.qchain.exact;

/**
 * A message key: a stable name and an English pattern with {@code {0}}, {@code {1}}, ... placeholders
 * ({@code ''} stands for one quote). Each module keeps its keys in one enum that implements this interface
 * ({@link ErrorKey} for this module's); {@link QchainException} carries any of them. Tests assert keys, not text.
 * Keys say what is wrong in the module's own terms; a front end adds its own hints (an option to use) when it prints
 * them.
 */
public interface MessageKey {

    /** The key's stable name (the enum constant's name). */
    String name();

    /** The English pattern. */
    String pattern();

    /**
     * Fills the pattern with the arguments.
     *
     * @param args values for {@code {0}}, {@code {1}}, ...
     * @return the message text
     */
    default String format(Object... args) {
        StringBuilder sb = new StringBuilder();
        String p = pattern();
        for (int i = 0; i < p.length(); i++) {
            char c = p.charAt(i);
            if (c == '\'' && i + 1 < p.length() && p.charAt(i + 1) == '\'') {
                sb.append('\'');
                i++;
            } else if (c == '{') {
                int close = p.indexOf('}', i);
                int idx = Integer.parseInt(p.substring(i + 1, close));
                sb.append(idx < args.length ? String.valueOf(args[idx]) : "{" + idx + "}");
                i = close;
            } else {
                sb.append(c);
            }
        }
        return sb.toString();
    }
}
