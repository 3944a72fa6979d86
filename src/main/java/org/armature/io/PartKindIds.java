package org.armature.io;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.armature.model.PartKind;

/**
 * The identifiers of part kinds in stage files and commands: the kind's name in lower case with
 * hyphens ({@code drive-pin}, {@code npn}, {@code relay}).
 */
public final class PartKindIds {

    private PartKindIds() {
    }

    /** The file identifier of a kind, e.g. {@code drive-pin} for {@link PartKind#DRIVE_PIN}. */
    public static String id(PartKind kind) {
        return kind.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** The kind with this identifier (exact, lower case), if any. */
    public static Optional<PartKind> byId(String id) {
        return Arrays.stream(PartKind.values()).filter(k -> id(k).equals(id)).findFirst();
    }

    /** All identifiers, in the order of {@link PartKind#values()}. */
    public static List<String> all() {
        return Arrays.stream(PartKind.values()).map(PartKindIds::id).toList();
    }
}
