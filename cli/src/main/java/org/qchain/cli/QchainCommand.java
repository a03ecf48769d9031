package org.qchain.cli;

import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.ArrayDeque;
import java.util.List;
import java.util.Deque;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.qchain.format.Caution;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.HelpCommand;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * The root command {@code qchain}. Called without a subcommand it says so on stderr ({@code qchain: no command
 * given; the commands are: ...}), prints its usage and exits 2.
 *
 * <p>{@link #newCommandLine(boolean)} builds the configured command tree (error handlers, exit code lists and the
 * caution footer on every help); {@link #run(String[])} is the process entry point used by {@link Main}.
 */
@Command(name = "qchain", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
    description = "Exact n-step transition probabilities of Markov chains: exact fractions, with correctly rounded"
        + " decimals beside them.",
    subcommands = {})
public final class QchainCommand implements Callable<Integer> {
    /**
     * The subcommands, in the order of the help. They are added by {@link #newCommandLine}, not by the annotation,
     * so that a process running one command builds the option model of that command only (picocli reads every
     * command's annotations when it is added: about a quarter of a second of start-up for all of them).
     */
    static final List<Class<?>> SUBCOMMANDS = List.of(StepCommand.class, SensCommand.class, ClosedCommand.class,
        CheckCommand.class, VerifyCommand.class, AvailCommand.class, ConvertCommand.class, ClassesCommand.class,
        LongRunCommand.class, AbsorbCommand.class, ReportCommand.class, DemoCommand.class, CompletionCommand.class, HelpCommand.class);
    /** Commands that need the whole tree: the demo, the completion script and help on other commands. */
    private static final List<String> NEED_ALL = List.of("demo", "completion", "help");
    /** The root's version options: given alone, they need no subcommand at all. */
    private static final List<String> VERSION_OPTIONS = List.of("--version", "-V");

    /** Milliseconds the Ctrl-C hook waits for the work to stop and clean up before the JVM halts. */
    private static final long INTERRUPT_GRACE_MS = 3000;

    private final boolean progressAllowed;

    /** The progress line in use, so that the Ctrl-C hook can clear it before its message. */
    private volatile TerminalProgress current;

    @Spec
    CommandSpec spec;

    /**
     * @param progressAllowed whether long work may show progress on stderr (stderr is a terminal)
     */
    QchainCommand(boolean progressAllowed) {
        this.progressAllowed = progressAllowed;
    }

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        err.println("qchain: no command given; the commands are: " + commandNames(spec.commandLine()));
        spec.commandLine().usage(err);
        err.flush();
        return ExitCodes.INPUT;
    }

    /** The subcommands' names, comma-separated, in the order of the help. */
    static String commandNames(CommandLine root) {
        return String.join(", ", root.getSubcommands().keySet());
    }

    /** A progress reporter for a subcommand; it prints only if progress is allowed. */
    TerminalProgress progress(PrintWriter err) {
        TerminalProgress p = new TerminalProgress(err, progressAllowed);
        current = p;
        return p;
    }

    /** Work that reports progress and yields a value. */
    interface Work<T> {
        T run(org.qchain.exact.Progress progress);
    }

    /**
     * Runs work with a progress line on stderr (shown only at a terminal, after a second) and clears it after.
     *
     * @param spec the subcommand, for its stderr
     * @param work the work
     * @return what the work returned
     */
    <T> T run(CommandSpec spec, Work<T> work) {
        TerminalProgress p = progress(spec.commandLine().getErr());
        try {
            return work.run(p);
        } finally {
            p.clear();
        }
    }

    /** Clears the progress line, if one is shown. */
    void clearProgress() {
        TerminalProgress p = current;
        if (p != null) {
            p.clear();
        }
    }

    /**
     * The configured command tree.
     *
     * @param progressAllowed whether long work may show progress on stderr; tests pass {@code false}
     * @return the command line, ready for {@code setOut}/{@code setErr} and {@code execute}
     */
    public static CommandLine newCommandLine(boolean progressAllowed) {
        return newCommandLine(progressAllowed, new Errors(), new String[0]);
    }

    /**
     * The command tree, with only the subcommand named by {@code first} when it names one that runs on its own
     * (the whole tree otherwise, or when {@code first} is null), and none for {@code --version} alone: what the
     * process needs for its arguments.
     */
    static CommandLine newCommandLine(boolean progressAllowed, Errors errors, String[] args) {
        CommandLine cl = new CommandLine(new QchainCommand(progressAllowed));
        String first = args.length > 0 ? args[0] : null;
        boolean versionOnly = args.length == 1 && VERSION_OPTIONS.contains(first);
        Class<?> only = null;
        if (first != null && !NEED_ALL.contains(first)) {
            for (Class<?> c : SUBCOMMANDS) {
                if (c.getAnnotation(Command.class).name().equals(first)) {
                    only = c;
                }
            }
        }
        for (Class<?> c : SUBCOMMANDS) {
            if (!versionOnly && (only == null || c == only)) {
                cl.addSubcommand(newInstance(c));
            }
        }
        cl.setExecutionExceptionHandler(errors);
        cl.setParameterExceptionHandler(errors);
        Map<String, String> codes = new LinkedHashMap<>();
        codes.put(" " + ExitCodes.OK, "success");
        codes.put(" " + ExitCodes.INTERNAL, "internal error (set QCHAIN_DEBUG=1 for a stack trace)");
        codes.put(" " + ExitCodes.INPUT, "bad input or usage: the message names file:line:col or the bad option");
        codes.put(" " + ExitCodes.OVER_TOLERANCE, "verify: a value is outside the tolerance");
        codes.put(ExitCodes.INTERRUPTED + "", "interrupted (Ctrl-C); no partial output file is left");
        Deque<CommandLine> todo = new ArrayDeque<>();
        todo.add(cl);
        while (!todo.isEmpty()) {
            CommandLine c = todo.pop();
            c.getCommandSpec().usageMessage()
                .exitCodeListHeading("%nExit codes:%n")
                .exitCodeList(codes)
                .footerHeading("%n")
                .footer(Caution.TEXT);
            todo.addAll(c.getSubcommands().values());
        }
        return cl;
    }

    private static Object newInstance(Class<?> c) {
        try {
            var ctor = c.getDeclaredConstructor();
            ctor.setAccessible(true);
            return ctor.newInstance();
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot create the command " + c.getName(), e);
        }
    }

    /**
     * Runs qchain as a process: UTF-8 stdout and stderr, progress when stderr is a terminal, a Ctrl-C hook that
     * interrupts the work and prints {@code qchain: interrupted} once, and no stack trace for any failure.
     *
     * @param args the command-line arguments
     * @return the exit code
     */
    static int run(String[] args) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        Errors errors = new Errors();
        CountDownLatch done = new CountDownLatch(1);
        Thread worker = Thread.currentThread();
        CommandLine cl = newCommandLine(stderrIsTerminal(), errors, args);
        QchainCommand root = cl.getCommand();
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            if (done.getCount() > 0) {
                // the JVM is shutting down before the work ended: a signal such as Ctrl-C
                root.clearProgress();
                errors.reportInterrupt(err);
                worker.interrupt();
                try {
                    done.await(INTERRUPT_GRACE_MS, TimeUnit.MILLISECONDS);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        }, "qchain-interrupt"));
        try {
            cl.setOut(out);
            cl.setErr(err);
            return cl.execute(args);
        } catch (Throwable t) {
            // errors (out of memory, stack overflow) pass through picocli's handlers
            return errors.report(t, err);
        } finally {
            out.flush();
            err.flush();
            done.countDown();
        }
    }

    /**
     * Whether stderr is a terminal. The launcher knows ({@code -Dqchain.stderr.tty=true|false} from {@code [ -t 2 ]});
     * otherwise {@code System.console() != null} is the proxy. {@code QCHAIN_PROGRESS=0} turns progress off.
     */
    static boolean stderrIsTerminal() {
        if ("0".equals(System.getenv("QCHAIN_PROGRESS"))) {
            return false;
        }
        String tty = System.getProperty("qchain.stderr.tty");
        if (tty != null) {
            return Boolean.parseBoolean(tty);
        }
        return System.console() != null;
    }
}
