package org.armature.model;

/**
 * A pin of a part, by designator and pin name ({@code Q1.c}).
 *
 * @param ref part designator
 * @param pin pin name
 */
public record PinRef(String ref, String pin) {

    @Override
    public String toString() {
        return ref + "." + pin;
    }
}
