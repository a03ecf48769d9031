package org.qchain.exact.longrun;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Deque;
import java.util.List;

/**
 * The communicating classes of a chain's one-step graph: which are closed (recurrent) and which transient, their
 * periods, the absorbing states. Classes are listed in the order of their first state in the model.
 *
 * @param classes   the classes, each a sorted list of state indices
 * @param closed    for each class, whether no edge leaves it
 * @param periods   for each class, the gcd of its cycle lengths; 0 for a single state without a self-loop (no return)
 * @param absorbing states i with P(i, i) = 1 (no edge to another state)
 * @param transients states in classes that are not closed, ascending
 */
public record Structure(List<List<Integer>> classes, List<Boolean> closed, List<Integer> periods,
                        List<Integer> absorbing, List<Integer> transients) {
    /** Copies the lists. */
    public Structure {
        classes = classes.stream().map(List::copyOf).toList();
        closed = List.copyOf(closed);
        periods = List.copyOf(periods);
        absorbing = List.copyOf(absorbing);
        transients = List.copyOf(transients);
    }

    /**
     * The structure of a graph.
     *
     * @param edge {@code edge[i][j]}: whether P(i, j) is not zero
     * @return the structure
     */
    public static Structure of(boolean[][] edge) {
        int n = edge.length;
        int[] comp = components(edge);
        int count = Arrays.stream(comp).max().orElse(-1) + 1;
        // renumber by first state
        int[] order = new int[count];
        Arrays.fill(order, -1);
        int next = 0;
        for (int i = 0; i < n; i++) {
            if (order[comp[i]] < 0) {
                order[comp[i]] = next++;
            }
        }
        List<List<Integer>> classes = new ArrayList<>();
        for (int c = 0; c < count; c++) {
            classes.add(new ArrayList<>());
        }
        for (int i = 0; i < n; i++) {
            comp[i] = order[comp[i]];
            classes.get(comp[i]).add(i);
        }
        List<Boolean> closed = new ArrayList<>();
        List<Integer> periods = new ArrayList<>();
        List<Integer> absorbing = new ArrayList<>();
        List<Integer> trans = new ArrayList<>();
        for (List<Integer> cls : classes) {
            boolean isClosed = true;
            for (int i : cls) {
                for (int j = 0; j < n; j++) {
                    if (edge[i][j] && comp[j] != comp[i]) {
                        isClosed = false;
                    }
                }
            }
            closed.add(isClosed);
            periods.add(period(edge, cls, comp));
            if (!isClosed) {
                trans.addAll(cls);
            }
            if (isClosed && cls.size() == 1) {
                absorbing.add(cls.get(0));
            }
        }
        trans.sort(null);
        return new Structure(classes, closed, periods, absorbing, trans);
    }

    /** Indices of the closed classes, in order. */
    public List<Integer> closedClasses() {
        List<Integer> out = new ArrayList<>();
        for (int c = 0; c < classes.size(); c++) {
            if (closed.get(c)) {
                out.add(c);
            }
        }
        return out;
    }

    /** Whether the chain is one class. */
    public boolean irreducible() {
        return classes.size() == 1;
    }

    /** The class of state i. */
    public int classOf(int i) {
        for (int c = 0; c < classes.size(); c++) {
            if (classes.get(c).contains(i)) {
                return c;
            }
        }
        throw new IllegalArgumentException("no state " + i);
    }

    /**
     * The period: gcd over edges u -> v inside the class of level(u) + 1 − level(v), levels from a breadth-first
     * search (common practice, no source; the standard characterisation of the period of a strongly connected graph).
     */
    private static int period(boolean[][] edge, List<Integer> cls, int[] comp) {
        int n = edge.length;
        int c = comp[cls.get(0)];
        int[] level = new int[n];
        Arrays.fill(level, -1);
        Deque<Integer> queue = new ArrayDeque<>();
        level[cls.get(0)] = 0;
        queue.add(cls.get(0));
        int g = 0;
        while (!queue.isEmpty()) {
            int u = queue.poll();
            for (int v = 0; v < n; v++) {
                if (!edge[u][v] || comp[v] != c) {
                    continue;
                }
                if (level[v] < 0) {
                    level[v] = level[u] + 1;
                    queue.add(v);
                } else {
                    g = gcd(g, Math.abs(level[u] + 1 - level[v]));
                }
            }
        }
        return g;
    }

    private static int gcd(int a, int b) {
        return b == 0 ? a : gcd(b, a % b);
    }

    /** Tarjan's strongly connected components, iterative (no recursion depth limit). */
    private static int[] components(boolean[][] edge) {
        int n = edge.length;
        int[] index = new int[n];
        int[] low = new int[n];
        int[] comp = new int[n];
        boolean[] onStack = new boolean[n];
        Arrays.fill(index, -1);
        int[] stack = new int[n];
        int sp = 0;
        int counter = 0;
        int compCount = 0;
        int[] callStack = new int[n];
        int[] nextChild = new int[n];
        for (int root = 0; root < n; root++) {
            if (index[root] >= 0) {
                continue;
            }
            int csp = 0;
            callStack[csp++] = root;
            index[root] = low[root] = counter++;
            stack[sp++] = root;
            onStack[root] = true;
            nextChild[root] = 0;
            while (csp > 0) {
                int u = callStack[csp - 1];
                if (nextChild[u] < n) {
                    int v = nextChild[u]++;
                    if (!edge[u][v]) {
                        continue;
                    }
                    if (index[v] < 0) {
                        index[v] = low[v] = counter++;
                        stack[sp++] = v;
                        onStack[v] = true;
                        nextChild[v] = 0;
                        callStack[csp++] = v;
                    } else if (onStack[v]) {
                        low[u] = Math.min(low[u], index[v]);
                    }
                } else {
                    csp--;
                    if (csp > 0) {
                        int parent = callStack[csp - 1];
                        low[parent] = Math.min(low[parent], low[u]);
                    }
                    if (low[u] == index[u]) {
                        int w;
                        do {
                            w = stack[--sp];
                            onStack[w] = false;
                            comp[w] = compCount;
                        } while (w != u);
                        compCount++;
                    }
                }
            }
        }
        return comp;
    }
}
