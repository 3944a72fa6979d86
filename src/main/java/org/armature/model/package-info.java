/**
 * The stage document: parts with parameters in SI units, their placement on a grid, wires, named
 * test points, the four stage templates and validation.
 *
 * <p>Everything here is immutable. Mutations ({@code Stage.withPart}, {@code Stage.withoutPart},
 * ...) return a new value; nothing else writes a document. Connectivity is geometric: a wire end or a
 * pin connects to every wire segment or pin at the same grid point ({@link Connectivity}).
 *
 * <p>{@link StageRecognition} is the one place that finds what each part does (drive pin, base or
 * gate network, switch, coil, suppressor, coil supply, contact side: {@link StageRoles}), from
 * connectivity alone, and names the nets: ground symbols name {@code gnd}, {@link TestPoint}s keep
 * the user's names, the nets the roles explain are named after them ({@code pin}, {@code control},
 * {@code switch}, {@code supply}, {@code contact-common}, ...), any other after one of its pins.
 *
 * <p>Validation never throws for bad user data: {@link Validator} returns {@link Finding}s with a
 * severity and a stable message key.
 */
package org.armature.model;
