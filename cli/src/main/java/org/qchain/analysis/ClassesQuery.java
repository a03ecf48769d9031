package org.qchain.analysis;

/**
 * Communicating classes, periods and absorbing states ({@code classes}), as a query for {@link Analysis#run}: the
 * same work as {@link Analysis#classes(LoadedModel, LongRunQuery)}.
 *
 * @param limits the route and size limits (as for {@code longrun})
 */
public record ClassesQuery(LongRunQuery limits) implements Query {
    /** The classes with the default limits, numeric where every parameter has a value. */
    public static ClassesQuery plain() {
        return new ClassesQuery(LongRunQuery.plain());
    }
}
