/**
 * Result values: immutable records of what a command computed (exact values with their decimals, warnings), the
 * only thing formatters see. Exact values are an interface so that symbolic formulas can use the same formatters.
 */
package org.qchain.cli.result;
