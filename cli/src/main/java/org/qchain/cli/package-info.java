/**
 * The {@code qchain} command-line program: picocli classes only.
 *
 * <p>One {@code Callable<Integer>} class per subcommand ({@code StepCommand}, {@code SensCommand},
 * {@code ClosedCommand}, {@code CheckCommand}, {@code DemoCommand}, {@code CompletionCommand}); shared options are
 * mixins ({@code ModelOptions}: MODEL and {@code --at}; {@code OutputOptions}: {@code --format}, {@code --digits},
 * {@code --output}; {@code DigitsOption}; {@code LimitOptions}: {@code --max-digits}, {@code --max-terms};
 * {@code SymbolicOptions}: {@code --factor} with {@code --max-terms}). A command turns its options into
 * a query of {@link org.qchain.analysis}, loads the model ({@code ModelOptions.load}), runs
 * {@link org.qchain.analysis.Analysis} with a progress line ({@code QchainCommand.run}), lays the result out with the
 * formatter of {@code --format} ({@link org.qchain.format}) and prints it ({@code Emitter}: stdout or an atomic
 * {@code --output} file; warnings on stderr).
 *
 * <p>Errors: {@code Errors} turns an input error into one line {@code qchain: file:line:col: message} with exit code
 * 2, a usage error into a message naming the option (exit 2), an interruption into {@code qchain: interrupted}
 * (exit 130), anything else into {@code qchain: internal error: ...} (exit 1). No stack trace unless
 * {@code QCHAIN_DEBUG=1}.
 *
 * <p>Numeric commands never touch {@code org.qchain.symbolic} or Symja, so they start fast; a test checks that no
 * Symja class is loaded by {@code step}, {@code check} and {@code demo} on numeric models.
 */
package org.qchain.cli;
