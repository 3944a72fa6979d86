package org.armature.model;

/**
 * One result of validation or of a check: what is wrong, where, and how badly.
 *
 * @param severity how serious
 * @param key stable message key (tests assert this, not the text), e.g. {@code param.out-of-range}
 * @param ref designator of the part concerned, or empty
 * @param field parameter key or pin concerned, or empty
 * @param message plain-words sentence for the user
 */
public record Finding(Severity severity, String key, String ref, String field, String message) {

    public Finding {
        ref = ref == null ? "" : ref;
        field = field == null ? "" : field;
    }
}
