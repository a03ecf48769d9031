package org.qchain.exact;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import net.jqwik.api.lifecycle.AddLifecycleHook;
import net.jqwik.api.lifecycle.AroundPropertyHook;
import net.jqwik.api.lifecycle.PropertyExecutionResult;
import net.jqwik.api.lifecycle.PropertyExecutor;
import net.jqwik.api.lifecycle.PropertyLifecycleContext;

/**
 * The tries of a heavy property in the default build; its {@code @Property(tries = ...)} stays the full count, run
 * with {@code -Dqchain.tries=full} (DEVELOPERS.md, "Tests"; {@code bench/long-check.sh}). The seed is the property's
 * own in both, so either run is the same every time. Holds no reference values.
 */
@Target(ElementType.METHOD)
@Retention(RetentionPolicy.RUNTIME)
@AddLifecycleHook(QuickTries.Hook.class)
public @interface QuickTries {
    /** The tries when the full count is not asked for. */
    int value();

    /** Sets the property's tries to {@link QuickTries#value()} unless {@code qchain.tries} is {@code full}. */
    final class Hook implements AroundPropertyHook {
        /**
         * Whether the full counts are asked for ({@code -Dqchain.tries=full}); plain JUnit loops read it to choose
         * their size.
         */
        public static boolean full() {
            return "full".equals(System.getProperty("qchain.tries"));
        }

        @Override
        public PropertyExecutionResult aroundProperty(PropertyLifecycleContext context, PropertyExecutor property) {
            if (!full()) {
                context.findAnnotation(QuickTries.class).ifPresent(q -> context.attributes().setTries(q.value()));
            }
            return property.execute();
        }
    }
}
