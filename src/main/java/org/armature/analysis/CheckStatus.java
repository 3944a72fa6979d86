package org.armature.analysis;

/** The verdict of one check. */
public enum CheckStatus {
    /** Within the limit with the margin users expect. */
    PASS,
    /** Within the absolute limit but short of the margin, or not judged (see the explanation). */
    WARN,
    /** Beyond the limit: the stage does not work, or a part is overstressed, at some corner. */
    FAIL;

    /** Lower-case word used in files and the CLI ({@code pass}, {@code warn}, {@code fail}). */
    public String word() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }

    /** The worse of two verdicts. */
    public CheckStatus worse(CheckStatus other) {
        return compareTo(other) >= 0 ? this : other;
    }
}
