package org.qchain.format;

import org.qchain.result.ClosedResult;

/** Phrases shared by every format's layout of closed forms. */
final class Closed {
    private Closed() {
    }

    /** What a cell is: {@code P^n(A -> B)} or {@code G(A -> B; z)}. */
    static String label(ClosedResult r, String from, String to) {
        String arrow = from + " -> " + to;
        return r.form() == ClosedResult.Form.GF ? "G(" + arrow + "; z)" : "P^n(" + arrow + ")";
    }

    static String what(ClosedResult r) {
        switch (r.form()) {
            case GF:
                return "generating functions G(z) = sum over n of P^n z^n";
            case RECURRENCE:
                return "linear recurrences in n, u(n) = P^n(from -> to)";
            default:
                return "closed form in n";
        }
    }

    /** Whether the conditions are known to hold inside the parameters' domains; empty without conditions. */
    static String domainNote(ClosedResult r) {
        if (r.conditions().isEmpty()) {
            return "";
        }
        if (r.notProved().isEmpty()) {
            return (r.conditions().size() == 1 ? " It" : " They") + " always hold"
                + (r.conditions().size() == 1 ? "s" : "") + " inside the parameters' domains.";
        }
        return " Not shown to hold throughout the parameters' domains: " + String.join(", ", r.notProved()) + ".";
    }
}
