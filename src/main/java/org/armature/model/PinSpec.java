package org.armature.model;

/**
 * One terminal of a part kind, at an offset from the part's origin in the unrotated symbol.
 *
 * @param name short pin name used in the netlist and files ({@code b}, {@code c}, {@code a1})
 * @param localX offset in grid units, to the right
 * @param localY offset in grid units, downwards
 * @param description plain words for tooltips ("base", "coil terminal A1")
 */
public record PinSpec(String name, int localX, int localY, String description) {
}
