/**
 * Output formats: one {@link org.qchain.cli.format.Formatter} per value of {@code --format} (text, JSON, CSV,
 * markdown, LaTeX). Formatters lay out result values and never compute; JSON is written by hand
 * ({@link org.qchain.cli.format.Json}, RFC 8259 escaping), CSV follows RFC 4180.
 */
package org.qchain.cli.format;
