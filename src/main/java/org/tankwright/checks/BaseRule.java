package org.tankwright.checks;

import java.util.List;

/** A rule with its identifier, title and the source of its limit, and a helper to add findings. */
abstract class BaseRule implements Rule {
    private final String id;
    private final String title;
    /** Where the rule's limit comes from. */
    final String source;

    BaseRule(String id, String title, String source) {
        this.id = id;
        this.title = title;
        this.source = source;
    }

    @Override
    public final String id() {
        return id;
    }

    @Override
    public final String title() {
        return title;
    }

    @Override
    public final String source() {
        return source;
    }

    /** Adds a finding of this rule (dangers and warnings get the deferral to local codes). */
    final void add(List<Finding> out, Severity s, double value, double limit, String unit, String element,
                   String message, String action) {
        out.add(Finding.of(id, s, value, limit, unit, source, element, message, action));
    }
}
