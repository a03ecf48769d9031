package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.lang.reflect.Method;
import java.net.MalformedURLException;
import java.net.URL;
import java.net.URLClassLoader;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;

/**
 * Numeric commands must not load Symja, JAS or our symbolic module (start-up time: Symja's evaluator alone costs
 * about a second). The commands run inside a class loader of their own over the test class path that records every
 * class it is asked for; the check fails as soon as any numeric code path touches one of those packages. (A rule of
 * this project, common practice, no source: the numbers it protects are in docs/performance.md, "Start-up".)
 *
 * <p>The commands of this class share one such loader, so its classes are loaded and compiled once rather than once
 * a command. A class is requested from the loader the first time any command needs it, so the classes that one
 * command requests are those it needs beyond the earlier commands'; since every earlier command was checked, the
 * union of all of them is free of the forbidden packages exactly when each command's own set is, which is what each
 * call checks (and {@link #nothingForbiddenWasLoadedLate} the whole, for classes loaded after a command returned).
 * The guard of the recording itself runs in a fresh loader.
 */
class NoSymjaOnNumericPathTest {
    private static final List<String> FORBIDDEN = List.of("org.matheclipse.", "edu.jas.", "org.qchain.symbolic.",
        "org.hipparchus.");

    /** A child-first loader for the application's classes that remembers each class name requested. */
    static final class RecordingLoader extends URLClassLoader {
        final Set<String> requested = ConcurrentHashMap.newKeySet();

        RecordingLoader(URL[] urls) {
            super(urls, ClassLoader.getPlatformClassLoader());
        }

        @Override
        protected Class<?> loadClass(String name, boolean resolve) throws ClassNotFoundException {
            requested.add(name);
            return super.loadClass(name, resolve);
        }
    }

    private static URL[] testClassPath() throws MalformedURLException {
        List<URL> urls = new ArrayList<>();
        for (String entry : System.getProperty("java.class.path").split(File.pathSeparator)) {
            if (!entry.isEmpty()) {
                urls.add(new File(entry).toURI().toURL());
            }
        }
        return urls.toArray(new URL[0]);
    }

    /** The classes that a fresh loader is asked for while the command runs (its exit code 0). */
    static Set<String> classesRequestedBy(String... args) throws Exception {
        try (RecordingLoader loader = new RecordingLoader(testClassPath())) {
            run(loader, 0, args);
            return Set.copyOf(loader.requested);
        }
    }

    /** The loader the commands of this class share, open from the first command to the end of the class. */
    private static RecordingLoader shared;

    @AfterAll
    static void nothingForbiddenWasLoadedLate() throws IOException {
        if (shared != null) {
            assertNoForbidden(shared.requested);
            shared.close();
            shared = null;
        }
    }

    private static Set<String> sharedRequestedBy(String... args) throws Exception {
        return sharedRequestedBy(0, args);
    }

    /** The classes that the shared loader was first asked for while the command ran. */
    private static Set<String> sharedRequestedBy(int expectedCode, String... args) throws Exception {
        if (shared == null) {
            shared = new RecordingLoader(testClassPath());
        }
        Set<String> before = Set.copyOf(shared.requested);
        run(shared, expectedCode, args);
        Set<String> added = new HashSet<>(shared.requested);
        added.removeAll(before);
        return added;
    }

    private static void run(RecordingLoader loader, int expectedCode, String... args) throws Exception {
        Class<?> root = loader.loadClass("org.qchain.cli.QchainCommand");
        Object cl = root.getMethod("newCommandLine", boolean.class).invoke(null, false);
        Class<?> clType = loader.loadClass("picocli.CommandLine");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        clType.getMethod("setOut", PrintWriter.class).invoke(cl, new PrintWriter(out));
        clType.getMethod("setErr", PrintWriter.class).invoke(cl, new PrintWriter(err));
        Method execute = clType.getMethod("execute", String[].class);
        // libraries that look classes up through the context loader (log4j, inside JAS) must see this one
        Thread t = Thread.currentThread();
        ClassLoader previous = t.getContextClassLoader();
        t.setContextClassLoader(loader);
        int code;
        try {
            code = (Integer) execute.invoke(cl, (Object) args);
        } finally {
            t.setContextClassLoader(previous);
        }
        assertEquals(expectedCode, code, () -> "stdout:\n" + out + "\nstderr:\n" + err);
        assertTrue((expectedCode == 0 ? out : err).toString().length() > 0);
    }

    private static void assertNoForbidden(Set<String> requested) {
        for (String name : requested) {
            for (String prefix : FORBIDDEN) {
                assertTrue(!name.startsWith(prefix), () -> "numeric command loaded " + name);
            }
        }
    }

    @Test
    void recordingLoaderSeesTheCommandsOwnClasses() throws Exception {
        // guards the test itself: if the loader saw nothing, the checks below would pass vacuously
        Set<String> requested = classesRequestedBy("step", Cli.model("plant.chain"), "-n", "4");
        assertTrue(requested.contains("org.qchain.cli.StepCommand"), requested::toString);
        assertTrue(requested.contains("org.qchain.exact.MatrixPowers"), requested::toString);
    }

    @Test
    void stepInEveryShapeAndFormatLoadsNoSymbolicClass() throws Exception {
        String m = Cli.model("plant.chain");
        assertNoForbidden(sharedRequestedBy("step", m, "-n", "6"));
        assertNoForbidden(sharedRequestedBy("step", m, "-n", "6", "--from", "Up", "--format", "latex"));
        assertNoForbidden(sharedRequestedBy("step", m, "-n", "6", "--from", "Up", "--to", "Down", "--paths", "2",
            "--format", "markdown", "--at", "w=1/10"));
        assertNoForbidden(sharedRequestedBy("step", m, "-n", "6", "--format", "json"));
        assertNoForbidden(sharedRequestedBy("step", m, "-n", "6", "--format", "csv"));
        assertNoForbidden(sharedRequestedBy("step", m, "-n", "600", "--from", "Up", "--certified", "--format", "json"));
        // a start distribution, a set of states, a table over n
        assertNoForbidden(sharedRequestedBy("step", m, "-n", "1..20", "--start", "Up=1/2", "--start", "Worn=1/2",
            "--to", "Worn,Down", "--format", "json"));
        assertNoForbidden(sharedRequestedBy("step", m, "-n", "0..60 by 20", "--from", "Up"));
    }

    @Test
    void aRowThatSumsToOneOnlyAtTheNominalPointIsRefusedWithoutTheSymbolicModule() throws Exception {
        // the identity check of row sums is the exact module's own (RowSums), not JAS's
        String m = Cli.model("bad/row-sum-nominal-quotient.chain");
        assertNoForbidden(sharedRequestedBy(2, "step", m, "-n", "3"));
        assertNoForbidden(sharedRequestedBy(2, "check", m));
    }

    @Test
    void continuousCommandsLoadNoSymbolicClass() throws Exception {
        String m = Cli.model("generator-set.chain");
        assertNoForbidden(sharedRequestedBy("step", m, "-t", "1,10"));
        assertNoForbidden(sharedRequestedBy("step", m, "-t", "1", "--from", "Both", "--format", "json"));
        assertNoForbidden(sharedRequestedBy("avail", m, "-t", "5", "--format", "markdown"));
        assertNoForbidden(sharedRequestedBy("convert", m, "--to", "uniformized"));
        assertNoForbidden(sharedRequestedBy("sens", m, "--of", "mttf", "--wrt", "mu", "--format", "json"));
        assertNoForbidden(sharedRequestedBy("sens", m, "--of", "mttf", "--wrt", "mu", "--sweep",
            "mu in [1/24, 1/6] by 1/48"));
        assertNoForbidden(sharedRequestedBy("sens", m, "-t", "1,24", "--from", "Both", "--to", "None", "--wrt", "mu"));
    }

    @Test
    void verifyAndStepDoublesLoadNoSymbolicClass() throws Exception {
        String m = Cli.model("plant.chain");
        String ref = "src/test/resources/reference/";
        assertNoForbidden(sharedRequestedBy("verify", m, "--against", ref + "plant-p4.csv", "-n", "4"));
        assertNoForbidden(sharedRequestedBy("verify", m, "--against", ref + "plant-p4-worn.json", "-n", "4", "--from",
            "Worn", "--format", "json"));
        assertNoForbidden(sharedRequestedBy("step", m, "-n", "4", "--format", "csv", "--double"));
        assertNoForbidden(sharedRequestedBy("step", m, "-n", "4", "--from", "Up", "--format", "json", "--double"));
    }

    @Test
    void checkAndDemoLoadNoSymbolicClass() throws Exception {
        assertNoForbidden(sharedRequestedBy("check", Cli.model("plant.chain")));
        assertNoForbidden(sharedRequestedBy("check", Cli.model("generator-set.chain")));
        assertNoForbidden(sharedRequestedBy("demo"));
    }

    @Test
    void classesLongrunAndAbsorbLoadNoSymbolicClass() throws Exception {
        String m = Cli.model("press.chain");
        assertNoForbidden(sharedRequestedBy("classes", m));
        assertNoForbidden(sharedRequestedBy("longrun", m, "--format", "json"));
        assertNoForbidden(sharedRequestedBy("longrun", Cli.model("plant.chain"), "--passage"));
        assertNoForbidden(sharedRequestedBy("absorb", m, "--reward", Cli.model("press-rewards.txt"), "--discount",
            "100/105", "--steps", "4", "--format", "markdown"));
    }
}
