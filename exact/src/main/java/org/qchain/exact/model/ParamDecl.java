package org.qchain.exact.model;

import java.util.Optional;
import org.qchain.exact.Rational;
import org.qchain.exact.SourcePos;

/**
 * A {@code param} line: a name, its domain (declared or the default of the chain kind) and an optional nominal value.
 *
 * @param name    the parameter name
 * @param domain  the allowed values
 * @param nominal the nominal value, if given
 * @param pos     where the name is written
 */
public record ParamDecl(String name, Domain domain, Optional<Rational> nominal, SourcePos pos) {
}
