package org.qchain.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.lang.reflect.Method;
import java.net.MalformedURLException;
import java.net.URL;
import java.net.URLClassLoader;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import org.junit.jupiter.api.Test;

/**
 * Numeric commands must not load Symja, JAS or our symbolic module (start-up time: Symja's evaluator alone costs
 * about a second). The commands run inside a fresh class loader over the test class path that records every class it
 * is asked for; the check fails as soon as any numeric code path touches one of those packages. (A rule of this
 * project, common practice, no source: the numbers it protects are in docs/performance.md, "Start-up".)
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

    static Set<String> classesRequestedBy(String... args) throws Exception {
        return classesRequestedBy(0, args);
    }

    static Set<String> classesRequestedBy(int expectedCode, String... args) throws Exception {
        try (RecordingLoader loader = new RecordingLoader(testClassPath())) {
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
            return Set.copyOf(loader.requested);
        }
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
        assertNoForbidden(classesRequestedBy("step", m, "-n", "6"));
        assertNoForbidden(classesRequestedBy("step", m, "-n", "6", "--from", "Up", "--format", "latex"));
        assertNoForbidden(classesRequestedBy("step", m, "-n", "6", "--from", "Up", "--to", "Down", "--paths", "2",
            "--format", "markdown", "--at", "w=1/10"));
        assertNoForbidden(classesRequestedBy("step", m, "-n", "6", "--format", "json"));
        assertNoForbidden(classesRequestedBy("step", m, "-n", "6", "--format", "csv"));
        assertNoForbidden(classesRequestedBy("step", m, "-n", "600", "--from", "Up", "--certified", "--format", "json"));
        // a start distribution, a set of states, a table over n
        assertNoForbidden(classesRequestedBy("step", m, "-n", "1..20", "--start", "Up=1/2", "--start", "Worn=1/2",
            "--to", "Worn,Down", "--format", "json"));
        assertNoForbidden(classesRequestedBy("step", m, "-n", "0..60 by 20", "--from", "Up"));
    }

    @Test
    void aRowThatSumsToOneOnlyAtTheNominalPointIsRefusedWithoutTheSymbolicModule() throws Exception {
        // the identity check of row sums is the exact module's own (RowSums), not JAS's
        String m = Cli.model("bad/row-sum-nominal-quotient.chain");
        assertNoForbidden(classesRequestedBy(2, "step", m, "-n", "3"));
        assertNoForbidden(classesRequestedBy(2, "check", m));
    }

    @Test
    void continuousCommandsLoadNoSymbolicClass() throws Exception {
        String m = Cli.model("generator-set.chain");
        assertNoForbidden(classesRequestedBy("step", m, "-t", "1,10"));
        assertNoForbidden(classesRequestedBy("step", m, "-t", "1", "--from", "Both", "--format", "json"));
        assertNoForbidden(classesRequestedBy("avail", m, "-t", "5", "--format", "markdown"));
        assertNoForbidden(classesRequestedBy("convert", m, "--to", "uniformized"));
        assertNoForbidden(classesRequestedBy("sens", m, "--of", "mttf", "--wrt", "mu", "--format", "json"));
        assertNoForbidden(classesRequestedBy("sens", m, "--of", "mttf", "--wrt", "mu", "--sweep",
            "mu in [1/24, 1/6] by 1/48"));
        assertNoForbidden(classesRequestedBy("sens", m, "-t", "1,24", "--from", "Both", "--to", "None", "--wrt", "mu"));
    }

    @Test
    void verifyAndStepDoublesLoadNoSymbolicClass() throws Exception {
        String m = Cli.model("plant.chain");
        String ref = "src/test/resources/reference/";
        assertNoForbidden(classesRequestedBy("verify", m, "--against", ref + "plant-p4.csv", "-n", "4"));
        assertNoForbidden(classesRequestedBy("verify", m, "--against", ref + "plant-p4-worn.json", "-n", "4", "--from",
            "Worn", "--format", "json"));
        assertNoForbidden(classesRequestedBy("step", m, "-n", "4", "--format", "csv", "--double"));
        assertNoForbidden(classesRequestedBy("step", m, "-n", "4", "--from", "Up", "--format", "json", "--double"));
    }

    @Test
    void checkAndDemoLoadNoSymbolicClass() throws Exception {
        assertNoForbidden(classesRequestedBy("check", Cli.model("plant.chain")));
        assertNoForbidden(classesRequestedBy("check", Cli.model("generator-set.chain")));
        assertNoForbidden(classesRequestedBy("demo"));
    }

    @Test
    void classesLongrunAndAbsorbLoadNoSymbolicClass() throws Exception {
        String m = Cli.model("press.chain");
        assertNoForbidden(classesRequestedBy("classes", m));
        assertNoForbidden(classesRequestedBy("longrun", m, "--format", "json"));
        assertNoForbidden(classesRequestedBy("longrun", Cli.model("plant.chain"), "--passage"));
        assertNoForbidden(classesRequestedBy("absorb", m, "--reward", Cli.model("press-rewards.txt"), "--discount",
            "100/105", "--steps", "4", "--format", "markdown"));
    }
}
