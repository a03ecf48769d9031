package org.qchain.analysis;

import java.util.Locale;
import java.util.Optional;
import org.qchain.exact.ctmc.RateSensitivity;

/** The command-line names of the figures of merit ({@code sens --of}): our own words. */
public final class Figures {
    private Figures() {
    }

    /** The name of a figure: {@code availability}, {@code unavailability}, {@code mttf}, {@code failure-frequency}. */
    public static String name(RateSensitivity.Figure f) {
        return f.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /**
     * The figure of a name.
     *
     * @param name the name as on the command line
     * @return the figure, or empty for an unknown name
     */
    public static Optional<RateSensitivity.Figure> of(String name) {
        for (RateSensitivity.Figure f : RateSensitivity.Figure.values()) {
            if (name(f).equals(name)) {
                return Optional.of(f);
            }
        }
        return Optional.empty();
    }
}
