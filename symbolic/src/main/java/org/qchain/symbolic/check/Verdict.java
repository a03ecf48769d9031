package org.qchain.symbolic.check;

import java.util.Map;
import java.util.Optional;
import org.qchain.exact.Rational;

/** The outcome of {@link RangeProver#nonNegative}: proven, refuted with a witness, or undecided with a note. */
record Verdict(Kind kind, Map<String, Rational> witness, String note) {
    enum Kind { HOLDS, FAILS, UNDECIDED }

    static Verdict holds() {
        return new Verdict(Kind.HOLDS, Map.of(), "");
    }

    static Verdict fails(Map<String, Rational> w, String where) {
        return new Verdict(Kind.FAILS, java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(w)), where);
    }

    static Verdict undecided(String note) {
        return new Verdict(Kind.UNDECIDED, Map.of(), note);
    }

    Optional<Map<String, Rational>> witnessOpt() {
        return kind == Kind.FAILS ? Optional.of(witness) : Optional.empty();
    }
}
