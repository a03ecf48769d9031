package org.qchain.cli.result;

/**
 * One exact value with its decimal form.
 *
 * @param exact   the exact value
 * @param decimal its decimal form, correctly rounded to the result's number of significant digits
 */
public record Entry(ExactValue exact, String decimal) {
}
