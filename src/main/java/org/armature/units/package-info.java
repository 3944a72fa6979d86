/**
 * SI units and numbers as engineers write them; knows nothing of any other Armature package.
 *
 * <ul>
 *   <li>{@link org.armature.units.Unit}: the units of the tool, with symbol, quantity name,
 *       whether negatives make sense and whether SI prefixes are printed.</li>
 *   <li>{@link org.armature.units.EngineeringNotation}: reads {@code 4700}, {@code 1.5e-3},
 *       {@code 16.7 mA}, {@code 22k} and IEC 60062 letter codes ({@code 4k7}, {@code 0R47}) and
 *       prints {@code 4.70 kΩ} or {@code 4k7}. {@code parse} throws
 *       {@link org.armature.units.UnitParseException}; {@code tryParse} returns a
 *       {@link org.armature.units.ParseResult} so input fields validate without exceptions. Both
 *       carry a {@link org.armature.units.ParseErrorKind} to key on and a full-sentence message
 *       naming the input with examples of valid input.</li>
 *   <li>{@link org.armature.units.ESeries}: the IEC 60063 preferred-value tables E6 to E192 as
 *       published, their tolerances, and rounding down, up or to nearest and stepping one value
 *       up or down across decades.</li>
 *   <li>{@link org.armature.units.PhysicalConstants}: k and q (exact, SI 2019), the thermal
 *       voltage kT/q, Celsius and kelvin.</li>
 * </ul>
 *
 * <p>Every value inside Armature is a double in the coherent SI unit (ohms, farads, seconds);
 * prefixes exist only in text. Everything here is immutable and thread-safe.
 */
package org.armature.units;
