package org.miscela.core.card;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import net.jqwik.api.lifecycle.AroundPropertyHook;
import net.jqwik.api.lifecycle.PropertyExecutionResult;
import net.jqwik.api.lifecycle.PropertyExecutor;
import net.jqwik.api.lifecycle.PropertyLifecycleContext;

/**
 * The fuzz profiles: the default keeps CI fast, {@code -Dmiscela.fuzz=full} runs the full count. A property names
 * both counts with {@link Tries} and registers this hook, which sets the count before jqwik starts the property (an
 * annotation's {@code tries} is a compile-time constant, so it cannot follow a system property itself).
 */
public final class FuzzProfile implements AroundPropertyHook {
    /** The system property that selects the profile. */
    public static final String PROPERTY = "miscela.fuzz";

    /** The tries of a fuzz property in each profile. */
    @Retention(RetentionPolicy.RUNTIME)
    @Target(ElementType.METHOD)
    public @interface Tries {
        int ci();

        int full();
    }

    public static boolean full() {
        return "full".equalsIgnoreCase(System.getProperty(PROPERTY, "").trim());
    }

    /** "full" or "default". */
    public static String name() {
        return full() ? "full" : "default";
    }

    @Override
    public PropertyExecutionResult aroundProperty(PropertyLifecycleContext context, PropertyExecutor property) {
        Tries tries = context.findAnnotation(Tries.class)
                .orElseThrow(() -> new IllegalStateException(context.label() + " needs @FuzzProfile.Tries"));
        context.attributes().setTries(full() ? tries.full() : tries.ci());
        return property.execute();
    }
}
