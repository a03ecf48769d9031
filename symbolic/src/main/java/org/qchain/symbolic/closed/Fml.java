package org.qchain.symbolic.closed;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * A small formula tree used only for printing closed forms, in two syntaxes: plain (the project's expression syntax,
 * {@code ^} for powers, {@code sqrt(...)}, {@code binomial(n, k)}) and LaTeX. Engines build trees; they never
 * concatenate output strings themselves, so both syntaxes always say the same thing.
 */
sealed interface Fml {

    /** An integer, a name or another atom. */
    record Atom(String plain, String latex) implements Fml {
    }

    /** A sum; terms that are {@link Neg} print with a minus sign. */
    record Sum(List<Fml> terms) implements Fml {
    }

    /** Unary minus. */
    record Neg(Fml operand) implements Fml {
    }

    /** A product. */
    record Prod(List<Fml> factors) implements Fml {
    }

    /** A quotient. */
    record Div(Fml num, Fml den) implements Fml {
    }

    /** A power. */
    record Pow(Fml base, Fml exponent) implements Fml {
    }

    /** A named function: {@code sqrt}, {@code binomial}, {@code abs}, {@code max}, {@code rootsum}. */
    record Call(String name, List<Fml> args) implements Fml {
    }

    Fml ZERO = integer(BigInteger.ZERO);
    Fml ONE = integer(BigInteger.ONE);

    static Fml integer(BigInteger k) {
        return k.signum() < 0 ? new Neg(integer(k.negate())) : new Atom(k.toString(), k.toString());
    }

    static Fml integer(long k) {
        return integer(BigInteger.valueOf(k));
    }

    static Fml name(String n) {
        return new Atom(n, latexName(n));
    }

    private static String latexName(String n) {
        if (n.length() == 1) {
            return n;
        }
        int u = n.indexOf('_');
        if (u > 0) {
            return n.substring(0, u) + "_{" + n.substring(u + 1) + "}";
        }
        return "\\mathit{" + n + "}";
    }

    static Fml sum(List<Fml> terms) {
        List<Fml> t = new ArrayList<>();
        for (Fml f : terms) {
            if (isZero(f)) {
                continue;
            }
            if (f instanceof Sum s) {
                t.addAll(s.terms());
            } else {
                t.add(f);
            }
        }
        if (t.isEmpty()) {
            return ZERO;
        }
        return t.size() == 1 ? t.get(0) : new Sum(List.copyOf(t));
    }

    static Fml sum(Fml a, Fml b) {
        return sum(List.of(a, b));
    }

    /** A product that drops factors 1, pulls minus signs to the front and is 0 if a factor is 0. */
    static Fml prod(List<Fml> factors) {
        List<Fml> t = new ArrayList<>();
        boolean negative = false;
        for (Fml f0 : factors) {
            Fml f = factors.size() > 1 ? signed(f0) : f0;
            if (isZero(f)) {
                return ZERO;
            }
            while (f instanceof Neg g) {
                negative = !negative;
                f = g.operand();
            }
            if (isOne(f)) {
                continue;
            }
            if (f instanceof Prod p) {
                t.addAll(p.factors());
            } else {
                t.add(f);
            }
        }
        Fml r = t.isEmpty() ? ONE : (t.size() == 1 ? t.get(0) : new Prod(List.copyOf(t)));
        return negative ? new Neg(r) : r;
    }

    static Fml prod(Fml a, Fml b) {
        return prod(List.of(a, b));
    }

    /**
     * A factor written with its sign outside: a sum whose first term is negative becomes minus the negated sum, so
     * {@code (-1 + b)*z} prints as {@code -(1 - b)*z}.
     */
    static Fml signed(Fml a) {
        if (a instanceof Sum s && s.terms().get(0) instanceof Neg) {
            List<Fml> t = new ArrayList<>();
            for (Fml x : s.terms()) {
                t.add(neg(x));
            }
            return new Neg(new Sum(List.copyOf(t)));
        }
        if (a instanceof Div d && d.num() instanceof Sum) {
            Fml n = signed(d.num());
            if (n instanceof Neg g) {
                return new Neg(new Div(g.operand(), d.den()));
            }
        }
        return a;
    }

    static Fml neg(Fml a) {
        if (isZero(a)) {
            return a;
        }
        return a instanceof Neg g ? g.operand() : new Neg(a);
    }

    static Fml div(Fml a, Fml b) {
        if (isOne(b)) {
            return a;
        }
        if (a instanceof Neg g) {
            return new Neg(new Div(g.operand(), b));
        }
        return new Div(a, b);
    }

    static Fml pow(Fml base, Fml exponent) {
        if (isOne(exponent)) {
            return base;
        }
        return new Pow(base, exponent);
    }

    static Fml call(String name, Fml... args) {
        return new Call(name, List.of(args));
    }

    static boolean isZero(Fml f) {
        return f instanceof Atom a && a.plain().equals("0");
    }

    static boolean isOne(Fml f) {
        return f instanceof Atom a && a.plain().equals("1");
    }

    /** The formula in the project's plain syntax. */
    static String plain(Fml f) {
        return Printer.plain(f, 0);
    }

    /** The formula in LaTeX (math mode, no delimiters). */
    static String latex(Fml f) {
        return Printer.latex(f, 0);
    }

    /** Printers; precedence 1 sum, 2 product and quotient, 3 unary minus, 4 power, 5 atom. */
    final class Printer {
        private Printer() {
        }

        static int prec(Fml f) {
            if (f instanceof Sum) {
                return 1;
            }
            if (f instanceof Prod || f instanceof Div) {
                return 2;
            }
            if (f instanceof Neg) {
                return 3;
            }
            if (f instanceof Pow) {
                return 4;
            }
            return 5;
        }

        static String plain(Fml f, int ctx) {
            String s;
            if (f instanceof Atom a) {
                s = a.plain();
            } else if (f instanceof Sum sm) {
                StringBuilder b = new StringBuilder();
                for (int i = 0; i < sm.terms().size(); i++) {
                    Fml t = sm.terms().get(i);
                    if (t instanceof Neg g) {
                        b.append(i == 0 ? "-" : " - ").append(plain(g.operand(), 2));
                    } else {
                        b.append(i == 0 ? "" : " + ").append(plain(t, 1));
                    }
                }
                s = b.toString();
            } else if (f instanceof Neg g) {
                s = "-" + plain(g.operand(), 2);
            } else if (f instanceof Prod p) {
                StringBuilder b = new StringBuilder();
                for (int i = 0; i < p.factors().size(); i++) {
                    b.append(i == 0 ? "" : "*").append(plain(p.factors().get(i), i == 0 ? 2 : 3));
                }
                s = b.toString();
            } else if (f instanceof Div d) {
                s = plain(d.num(), 2) + "/" + plain(d.den(), 3);
            } else if (f instanceof Pow w) {
                s = plain(w.base(), 5) + "^" + plain(w.exponent(), 5);
            } else {
                Call c = (Call) f;
                List<String> args = new ArrayList<>();
                for (Fml a : c.args()) {
                    args.add(plain(a, 0));
                }
                s = c.name() + "(" + String.join(", ", args) + ")";
            }
            return prec(f) < ctx ? "(" + s + ")" : s;
        }

        static String latex(Fml f, int ctx) {
            String s;
            if (f instanceof Atom a) {
                s = a.latex();
            } else if (f instanceof Sum sm) {
                StringBuilder b = new StringBuilder();
                for (int i = 0; i < sm.terms().size(); i++) {
                    Fml t = sm.terms().get(i);
                    if (t instanceof Neg g) {
                        b.append(i == 0 ? "-" : " - ").append(latex(g.operand(), 2));
                    } else {
                        b.append(i == 0 ? "" : " + ").append(latex(t, 1));
                    }
                }
                s = b.toString();
            } else if (f instanceof Neg g) {
                s = "-" + latex(g.operand(), 2);
            } else if (f instanceof Prod p) {
                StringBuilder b = new StringBuilder();
                for (int i = 0; i < p.factors().size(); i++) {
                    Fml x = p.factors().get(i);
                    String sep = i == 0 ? "" : (x instanceof Atom a && Character.isDigit(a.latex().charAt(0)) ? " \\cdot " : " ");
                    b.append(sep).append(latex(x, i == 0 ? 2 : 3));
                }
                s = b.toString();
            } else if (f instanceof Div d) {
                s = "\\frac{" + latex(d.num(), 0) + "}{" + latex(d.den(), 0) + "}";
                return s; // a fraction never needs brackets
            } else if (f instanceof Pow w) {
                String base = latex(w.base(), 5);
                if (w.base() instanceof Div) {
                    base = "\\left(" + base + "\\right)";
                }
                s = base + "^{" + latex(w.exponent(), 0) + "}";
            } else {
                Call c = (Call) f;
                List<String> args = new ArrayList<>();
                for (Fml a : c.args()) {
                    args.add(latex(a, 0));
                }
                switch (c.name()) {
                    case "sqrt":
                        return "\\sqrt{" + args.get(0) + "}";
                    case "binomial":
                        return "\\binom{" + args.get(0) + "}{" + args.get(1) + "}";
                    case "abs":
                        return "\\left|" + args.get(0) + "\\right|";
                    case "rootsum":
                        return "\\sum_{" + args.get(1) + "(r) = 0} r^{" + args.get(0) + "}";
                    case "exp":
                        return "e^{" + args.get(0) + "}";
                    case "rootsumexp":
                        return "\\sum_{" + args.get(2) + "(r) = 0} r^{" + args.get(0) + "} e^{r " + args.get(1) + "}";
                    case "re":
                        return "\\operatorname{Re}\\left(" + args.get(0) + "\\right)";
                    case "maxre":
                        return "\\max_{" + args.get(0) + "(r) = 0} \\operatorname{Re} r";
                    default:
                        String name = c.name().length() == 1 ? c.name() : "\\operatorname{" + c.name() + "}";
                        return name + "\\left(" + String.join(", ", args) + "\\right)";
                }
            }
            return prec(f) < ctx ? "\\left(" + s + "\\right)" : s;
        }
    }
}
