package org.qchain.format;

import java.util.List;

/** Short text forms of a path of states. */
final class Paths {
    /** Runs of at least this many equal states are written {@code Name xK}. */
    private static final int RUN = 3;

    private Paths() {
    }

    /** The states separated by {@code " > "}, runs written as {@code Up x11}. */
    static String compact(List<String> states) {
        StringBuilder sb = new StringBuilder();
        int i = 0;
        while (i < states.size()) {
            int j = i;
            while (j < states.size() && states.get(j).equals(states.get(i))) {
                j++;
            }
            int run = j - i;
            if (sb.length() > 0) {
                sb.append(" > ");
            }
            if (run >= RUN) {
                sb.append(states.get(i)).append(" x").append(run);
                i = j;
            } else {
                sb.append(states.get(i));
                i++;
            }
        }
        return sb.toString();
    }

    /** Whether {@link #compact} shortens any run of the path. */
    static boolean hasRun(List<String> states) {
        int run = 1;
        for (int i = 1; i < states.size(); i++) {
            run = states.get(i).equals(states.get(i - 1)) ? run + 1 : 1;
            if (run >= RUN) {
                return true;
            }
        }
        return false;
    }
}
