/**
 * The analysis layer: the one way from a model and a question to a typed result, without the command line (no
 * picocli here; a test scans the sources).
 *
 * <p>{@link org.qchain.analysis.LoadedModel} parses a model once, resolves its parameter point once (nominal values,
 * overridden by given ones) and validates it once: numerically at the point through the exact module when every used
 * parameter has a value, else with the parameters symbolic behind {@code SymbolicValidation}, so that numeric runs
 * load no JAS or Symja class; either way, rows of a model with parameters must sum to 1 identically in them
 * ({@link org.qchain.exact.model.RowSums}, without JAS), so every command refuses the same models. A typed query
 * ({@link org.qchain.analysis.StepQuery}, {@link org.qchain.analysis.SensQuery},
 * {@link org.qchain.analysis.ClosedQuery}, {@link org.qchain.analysis.CheckQuery}, and the others that
 * {@link org.qchain.analysis.Query} permits) goes to {@link org.qchain.analysis.Analysis}, which picks the
 * {@link org.qchain.analysis.Route}, runs the query's size guard ({@code SizeGuard}) before any engine and returns a
 * result of
 * {@code org.qchain.result}. The guard's decisions are all made from the model and the query: where an engine's own
 * figure needs its work (a sweep's formula, a closed form's factors), the guard uses an a-priori upper bound of that
 * figure, and the engine's check stays as a second line. {@code NumericEngine} calls the exact module only; {@code SymbolicEngine} is the one
 * class that names symbolic types.
 *
 * <pre>{@code
 * LoadedModel m = LoadedModel.load(Path.of("pump.chain"), Optional.of("p=1/20"));
 * Result r = Analysis.step(m, StepQuery.entry(12, "Up", "Down"), Progress.NONE);
 * String text = OutputFormat.TEXT.formatter(12).format(r);
 * }</pre>
 */
package org.qchain.analysis;
