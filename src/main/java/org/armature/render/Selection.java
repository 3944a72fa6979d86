package org.armature.render;

import java.util.Set;

/**
 * What is selected in a drawing: parts by designator and wires by index in {@code Stage.wires()}.
 *
 * @param refs selected part designators
 * @param wires selected wire indices
 */
public record Selection(Set<String> refs, Set<Integer> wires) {

    /** Nothing selected. */
    public static final Selection EMPTY = new Selection(Set.of(), Set.of());

    public Selection {
        refs = Set.copyOf(refs);
        wires = Set.copyOf(wires);
    }

    /** One part. */
    public static Selection ofPart(String ref) {
        return new Selection(Set.of(ref), Set.of());
    }

    /** True when nothing is selected. */
    public boolean isEmpty() {
        return refs.isEmpty() && wires.isEmpty();
    }
}
