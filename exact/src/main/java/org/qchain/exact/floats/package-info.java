/**
 * IEEE 754-2019 binary64 values seen from exact arithmetic.
 *
 * <ul>
 * <li>{@link org.qchain.exact.floats.Binary64}: the correctly rounded double of a rational (ties to even,
 * subnormals, overflow to infinity), the exact value of a double, and the distance between doubles in units in the
 * last place.</li>
 * <li>{@link org.qchain.exact.floats.FloatText}: the shortest decimal that reads back as the same double (ECMAScript's
 * rule and layout; Java 17's {@code Double.toString} is not always the shortest), and hexadecimal floats as in the
 * Java Language Specification, §3.10.2, read exactly.</li>
 * </ul>
 *
 * <h2>Example</h2>
 * <pre>{@code
 * double d = Binary64.round(Rational.of(1, 10));   // 0.1
 * String s = FloatText.shortest(d);                // "0.1"
 * String h = FloatText.hex(d);                     // "0x1.999999999999ap-4"
 * Rational back = FloatText.parseHex(h);           // 3602879701896397/36028797018963968
 * long u = Binary64.ulpDistance(d, Math.nextUp(d)); // 1
 * }</pre>
 */
package org.qchain.exact.floats;
