package org.qchain.symbolic;

/**
 * One-time set-up before the first JAS class initialises (see the library notes): route log4j to its simple
 * context so that JAS prints nothing on stderr, and switch JAS's thread pool off so that the JVM exits promptly.
 * Every public entry point of this package that touches JAS calls {@link #init()} first, from a static
 * initialiser.
 */
final class JasRuntime {
    private static volatile boolean done;

    private JasRuntime() {
    }

    static void init() {
        if (done) {
            return;
        }
        synchronized (JasRuntime.class) {
            if (done) {
                return;
            }
            if (System.getProperty("log4j2.loggerContextFactory") == null) {
                System.setProperty("log4j2.loggerContextFactory",
                    "org.apache.logging.log4j.simple.SimpleLoggerContextFactory");
            }
            // JAS reads this flag when it first needs a pool; set before any gcd or factorisation runs.
            edu.jas.kern.ComputerThreads.NO_THREADS = true;
            done = true;
        }
    }
}
