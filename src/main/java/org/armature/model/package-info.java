/**
 * The stage document: parts with parameters in SI units, their placement on a grid, wires, named
 * test points, the four stage templates and validation.
 *
 * <p>Everything here is immutable. Mutations ({@code Stage.withPart}, {@code Stage.withoutPart},
 * ...) return a new value; nothing else writes a document. Connectivity is geometric: a wire end or a
 * pin connects to every wire segment or pin at the same grid point ({@link Connectivity}). Nets take
 * their names from {@link TestPoint}s and from ground symbols ({@code gnd}); the rest are numbered.
 *
 * <p>Validation never throws for bad user data: {@link Validator} returns {@link Finding}s with a
 * severity and a stable message key.
 */
package org.armature.model;
