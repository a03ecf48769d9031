package org.qchain.exact.model;

/** Whether entries are one-step probabilities or transition rates. */
public enum ChainKind {
    /** Discrete time: entries are one-step probabilities; the unlisted self-transition is the remainder. */
    DISCRETE("discrete"),
    /** Continuous time: entries are rates; the diagonal of the generator is minus the row's total rate. */
    CONTINUOUS("continuous");

    private final String word;

    ChainKind(String word) {
        this.word = word;
    }

    /** The word used in model files and JSON ({@code discrete}, {@code continuous}). */
    public String word() {
        return word;
    }
}
