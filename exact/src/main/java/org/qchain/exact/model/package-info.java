/**
 * Model files: reading a chain from text, and turning it into an exact matrix.
 *
 * <p>Data flows one way. {@link org.qchain.exact.model.ModelParser} reads the model format (described in full in
 * {@code docs/model-format.md}) or a CSV matrix into a {@link org.qchain.exact.model.Model}: its
 * {@link org.qchain.exact.model.ChainKind kind}, its {@link org.qchain.exact.model.ParamDecl parameters} with
 * {@link org.qchain.exact.model.Domain domains} and nominal values, its states, and its
 * {@link org.qchain.exact.model.Transition transitions} as small expression trees of our own
 * ({@link org.qchain.exact.model.Expr}). Parsing checks text, names and structure but evaluates nothing, so a
 * model with free parameters parses; the symbolic module maps the same trees into its ring.
 * {@link org.qchain.exact.model.Chains} evaluates a model at rational parameter values and validates the numbers
 * (probabilities in [0, 1], rows summing to exactly 1, non-negative rates), returning a
 * {@link org.qchain.exact.RationalMatrix}: the one-step matrix of a discrete chain or the generator of a
 * continuous one. {@link org.qchain.exact.model.RowSums} proves that the rows of a discrete chain sum to 1
 * identically in its parameters (exact rational-function identities over sparse polynomials, no JAS), so numeric
 * runs refuse the same models as symbolic ones.
 *
 * <pre>{@code
 * Model m = ModelParser.parse("pump.chain", """
 *     param p in (0, 1) = 1/20
 *     states Up Down
 *     Up   Down p
 *     Down Up   1/2
 *     """);
 * RationalMatrix nominal = Chains.transitionMatrix(m);                       // [[19/20, 1/20], [1/2, 1/2]]
 * RationalMatrix other = Chains.transitionMatrix(m, Chains.parseAssignments(m, "p=0.1"));
 * }</pre>
 *
 * <p>Every error is a {@link org.qchain.exact.QchainException} with an {@link org.qchain.exact.ErrorKey} and, for
 * errors in a file, a {@link org.qchain.exact.SourcePos} printed as {@code file:line:column}. The lexer, the
 * expression parser, the CSV reader and the printer are package-private helpers.
 *
 * <p>Robustness: reading is linear in the text (the model stores its transitions sparsely); numbers follow the one
 * grammar of {@link org.qchain.exact.NumberGrammar} with its limits; sums, products, signs, folds
 * ({@link org.qchain.exact.model.Expr#fold}) and printing use explicit stacks, so no expression depth overflows the
 * call stack, and only parentheses nest (at most 200 deep). The {@link org.qchain.exact.InputLimits} a model was
 * read under travel with it; {@link org.qchain.exact.model.Chains#requireDense} refuses, before any work, a dense
 * matrix past their size limit.
 */
package org.qchain.exact.model;
