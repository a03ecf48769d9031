/**
 * The {@code qchain} command-line program (picocli).
 *
 * <p>One class per subcommand ({@code StepCommand}, {@code CheckCommand}, {@code DemoCommand},
 * {@code CompletionCommand}), each a {@code Callable<Integer>}; shared options are mixins ({@code ModelOptions},
 * {@code OutputOptions}). A command wires: parse the model ({@code LoadedChain}), choose how to evaluate it
 * ({@code EvaluationRoute}, the one place that will route free parameters to symbolic output), estimate the size,
 * call the engine ({@code Stepper}), hand the result value ({@link org.qchain.cli.result}) to the formatter of
 * {@code --format} ({@link org.qchain.cli.format}), and print it ({@code Emitter}: stdout or an atomic
 * {@code --output} file; warnings on stderr).
 *
 * <p>Errors: {@code Errors} turns an input error into one line {@code qchain: file:line:col: message} with exit code
 * 2, a usage error into a message naming the option (exit 2), anything else into {@code qchain: internal error: ...}
 * (exit 1). No stack trace unless {@code QCHAIN_DEBUG=1}.
 *
 * <p>Numeric commands never touch {@code org.qchain.symbolic} or Symja, so they start fast; a test checks that no
 * Symja class is loaded by {@code step}.
 *
 * <p>{@code ClosedCommand} ({@code qchain closed}) declares its options only; its work is in {@code ClosedRun}, which
 * calls {@link org.qchain.symbolic.closed.ClosedForms} and builds a {@link org.qchain.cli.result.ClosedResult} for
 * {@link org.qchain.cli.format.ClosedFormatter}, so that building the command tree loads no symbolic class.
 */
package org.qchain.cli;
