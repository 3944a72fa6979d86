package org.armature.model;

/**
 * The operating conditions of a stage: drive state and ambient temperatures. Every check takes
 * ambient as an input; junction and coil temperatures follow from it.
 *
 * @param pinHigh drive pin state for the DC operating point
 * @param ambientCelsius ambient for the nominal operating point
 * @param ambientMinCelsius coldest ambient for the corner checks
 * @param ambientMaxCelsius hottest ambient for the corner checks
 */
public record Conditions(boolean pinHigh, double ambientCelsius, double ambientMinCelsius,
                         double ambientMaxCelsius) {

    /** Defaults: pin high, 25 °C nominal, −10 °C to 50 °C for the corners (typical indoor enclosure range). */
    public static final Conditions DEFAULT = new Conditions(true, 25, -10, 50);

    public Conditions {
        if (!Double.isFinite(ambientCelsius) || ambientCelsius < -273.15) {
            throw new IllegalArgumentException("ambientCelsius must be a finite temperature above absolute zero");
        }
        if (!(ambientMinCelsius <= ambientMaxCelsius)) {
            throw new IllegalArgumentException("ambientMinCelsius must not exceed ambientMaxCelsius");
        }
    }

    /** The same conditions with the pin in another state. */
    public Conditions withPinHigh(boolean high) {
        return new Conditions(high, ambientCelsius, ambientMinCelsius, ambientMaxCelsius);
    }

    /** The same conditions at another nominal ambient. */
    public Conditions withAmbient(double celsius) {
        return new Conditions(pinHigh, celsius, Math.min(ambientMinCelsius, celsius), Math.max(ambientMaxCelsius, celsius));
    }
}
