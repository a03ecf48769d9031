/**
 * Output formats: one {@link org.qchain.format.Formatter} per value of {@code --format} (text, JSON, CSV, Markdown,
 * LaTeX), each with one method per result type of {@code org.qchain.result}. Formatters lay out results and never
 * compute beyond rounding an exact value to the digits they were made with. Shared helpers: {@code TextTable}
 * (aligned plain-text tables), {@code Text} (decimals, CSV fields per RFC 4180, Markdown and LaTeX escaping, the one
 * Rational-to-{@code \frac} conversion), {@link org.qchain.format.Json} (RFC 8259, written by hand) and
 * {@link org.qchain.format.Caution}. No picocli here (a test scans the sources).
 */
package org.qchain.format;
