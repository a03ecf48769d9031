/**
 * Model files: the parsed form of a chain ({@link org.qchain.exact.model.Model}) with its parameters, states and
 * transitions as small expression trees ({@link org.qchain.exact.model.Expr}).
 */
package org.qchain.exact.model;
