package org.armature.model;

import java.util.List;

/**
 * Definition of one choice-valued setting of a part kind (for example a load's kind).
 *
 * @param key stable key used in files
 * @param label short label for the part sheet
 * @param allowed the allowed values, first is the default
 * @param description one sentence for the part sheet
 */
public record OptionSpec(String key, String label, List<String> allowed, String description) {

    public OptionSpec {
        allowed = List.copyOf(allowed);
        if (allowed.isEmpty()) {
            throw new IllegalArgumentException("allowed must not be empty for " + key);
        }
    }

    /** The default value: the first allowed one. */
    public String defaultValue() {
        return allowed.get(0);
    }
}
