package org.qchain.cli;

/** The entry point of the {@code qchain} program. */
public final class Main {
    private Main() {
    }

    /**
     * Runs qchain and exits with its code (0 ok, 2 bad input or usage, 1 internal error, 130 interrupted).
     *
     * @param args the command-line arguments
     */
    public static void main(String[] args) {
        System.exit(QchainCommand.run(args));
    }
}
