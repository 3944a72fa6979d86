package org.armature.model;

/** How serious a finding is. */
public enum Severity {
    /** Worth knowing; nothing wrong. */
    INFO,
    /** Probably a mistake or a thin margin. */
    WARNING,
    /** The stage cannot be solved or cannot work as drawn. */
    ERROR
}
