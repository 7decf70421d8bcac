package org.tankwright.design;

import org.tankwright.units.Dimension;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/**
 * Describes one value of the design document: its JSON key, dimension, allowed range, default
 * and meaning. The JSON codec, the validator, the editor forms and the documentation all read it,
 * so each field is described once.
 */
@Retention(RetentionPolicy.RUNTIME)
@Target({ElementType.RECORD_COMPONENT, ElementType.FIELD, ElementType.METHOD, ElementType.PARAMETER})
public @interface Field {
    /** The JSON key; empty means snake_case of the component name plus the unit suffix. */
    String key() default "";

    /** The physical dimension (numbers only). */
    Dimension dim() default Dimension.DIMENSIONLESS;

    /** Smallest allowed value (numbers only). */
    double min() default Double.NEGATIVE_INFINITY;

    /** Largest allowed value (numbers only). */
    double max() default Double.POSITIVE_INFINITY;

    /** Whether {@link #min()} itself is excluded. */
    boolean minExclusive() default false;

    /** Default value as text through the units parser (or an enum token); empty means none. */
    String def() default "";

    /** Whether the value must be given (primitive components are always required unless a default exists). */
    boolean required() default false;

    /** One line saying what the value means, shown as a tooltip and in the format documentation. */
    String doc() default "";
}
