package org.armature.devices;

/**
 * The physics of a contact-side load that the contacts see: its steady current, its inrush at
 * closing and its decay, and what it stores in its inductance when the contacts part.
 *
 * <p>Inrush by kind (peak at closing ÷ steady current; relay makers' technical notes give tables of
 * typical inrush by load kind, check-values.md CT-5, common practice), each replaceable by the user's own
 * figure:
 * <ul>
 * <li>resistive, LED with resistor: ×1;</li>
 * <li>incandescent lamp: the cold-to-hot resistance ratio of tungsten,
 *     R(T_hot)/R(T_cold) = (T_hot/T_cold)^{@value #TUNGSTEN_RESISTIVITY_EXPONENT} (CT-6; a power-law fit
 *     ρ ∝ T^1.2 to the published tungsten resistivity tables, e.g. Forsythe and Worthing, "The
 *     properties of tungsten and the characteristics of tungsten lamps", Astrophys. J. 61, 1925;
 *     the exponent is from memory), decaying as the filament heats with a time constant of
 *     {@value #LAMP_INRUSH_SECONDS} s (typical, from memory);</li>
 * <li>motor: locked-rotor current ×{@value #MOTOR_INRUSH_MULTIPLE} (CT-5 gives ×5–10) for
 *     {@value #MOTOR_INRUSH_SECONDS} s (typical start, from memory);</li>
 * <li>solenoid or contactor coil: on AC ×{@value #AC_SOLENOID_INRUSH_MULTIPLE} while its gap is open
 *     (CT-5 gives ×10–20) for {@value #AC_SOLENOID_INRUSH_SECONDS} s; on DC ×1 (the current rises
 *     with L/R);</li>
 * <li>capacitive (a power supply's input): the crest of the rail over the loop resistance,
 *     V_pk/R_loop, decaying with R_loop·C.</li>
 * </ul>
 * On AC the peak is taken at the crest: √2 × multiple × steady RMS current.
 *
 * <p>At break an inductive load is a series R–L: on DC, R = V/I and L from the load's inductance
 * or, if not given, from the DC-13 test load's time constant (T0.95 ≈ 6·P ms, so L/R = 2 ms per
 * watt, at most 100 ms; IEC 60947-5-1, from memory); on AC, R = |Z|·cos φ and
 * L = |Z|·sin φ / (2π·f) with f = {@value #MAINS_HERTZ} Hz.
 *
 * @param kind what the load is
 * @param resistanceOhms steady V/I when on (a lamp's hot filament; an AC motor or solenoid: |Z|;
 *     an LED: its series resistor), ohms, positive
 * @param inrushMultiple the user's inrush multiple, or 0 for the kind's typical one
 * @param inrushSeconds the user's inrush decay time constant, seconds, or 0 for the typical one
 * @param powerFactor the user's cos φ for AC, or 0 for the kind's typical one
 * @param inductanceHenries the user's inductance for DC, henries, or 0 for the typical one
 * @param filamentKelvin a lamp's hot filament temperature, kelvin
 * @param capacitanceFarads a capacitive load's input capacitance, farads, or 0 for the typical
 *     {@value #CAPACITIVE_FARADS_PER_WATT} F per watt
 * @param loopResistanceOhms source and wiring resistance limiting a capacitive inrush, ohms
 * @param forwardVolts an LED's forward voltage, volts
 * @param ratedWatts the rated power, watts, or 0 when not given
 */
public record ContactLoad(LoadKind kind, double resistanceOhms, double inrushMultiple, double inrushSeconds,
                          double powerFactor, double inductanceHenries, double filamentKelvin,
                          double capacitanceFarads, double loopResistanceOhms, double forwardVolts,
                          double ratedWatts) {

    /** Exponent of the tungsten resistivity power law ρ ∝ T^n (CT-6; from memory). */
    public static final double TUNGSTEN_RESISTIVITY_EXPONENT = 1.2;
    /** Filament heating time constant of a small lamp, seconds (typical, from memory). */
    public static final double LAMP_INRUSH_SECONDS = 0.01;
    /** Locked-rotor multiple (CT-5: ×5–10; common practice). */
    public static final double MOTOR_INRUSH_MULTIPLE = 6;
    /** Time a small motor takes to start, as a decay constant, seconds (typical, from memory). */
    public static final double MOTOR_INRUSH_SECONDS = 0.2;
    /** An AC solenoid's open-gap multiple (CT-5: ×10–20; common practice). */
    public static final double AC_SOLENOID_INRUSH_MULTIPLE = 10;
    /** An AC solenoid's pull-in time, as a decay constant, seconds (typical, from memory). */
    public static final double AC_SOLENOID_INRUSH_SECONDS = 0.02;
    /** Typical cos φ of a small AC motor (typical, from memory). */
    public static final double MOTOR_POWER_FACTOR = 0.8;
    /** Typical cos φ of an AC solenoid or contactor coil, closed (typical, from memory; AC-15 tests use 0.3). */
    public static final double SOLENOID_POWER_FACTOR = 0.4;
    /** L/R of a DC electromagnetic load per watt, seconds per watt (DC-13: T0.95 ≈ 6·P ms, from memory). */
    public static final double DC_TIME_CONSTANT_SECONDS_PER_WATT = 0.002;
    /** Largest default L/R of a DC electromagnetic load, seconds (DC-13 caps T0.95 at 300 ms, from memory). */
    public static final double DC_TIME_CONSTANT_MAX_SECONDS = 0.1;
    /** Typical input capacitance of a power supply per watt, farads per watt (from memory). */
    public static final double CAPACITIVE_FARADS_PER_WATT = 2e-6;
    /** Mains frequency for the AC reactance, hertz. */
    public static final double MAINS_HERTZ = 50;

    public ContactLoad {
        if (kind == null) {
            throw new IllegalArgumentException("kind must not be null");
        }
        if (!(resistanceOhms > 0) || !Double.isFinite(resistanceOhms)) {
            throw new IllegalArgumentException("resistanceOhms must be positive and finite, was " + resistanceOhms);
        }
        if (!(inrushMultiple >= 0) || !(inrushSeconds >= 0) || !(powerFactor >= 0 && powerFactor <= 1)
                || !(inductanceHenries >= 0) || !(capacitanceFarads >= 0) || !(ratedWatts >= 0)) {
            throw new IllegalArgumentException("inrushMultiple, inrushSeconds, inductanceHenries, capacitanceFarads"
                    + " and ratedWatts must not be negative, and powerFactor must be in [0, 1]");
        }
        if (!(filamentKelvin > 0) || !(loopResistanceOhms > 0) || !(forwardVolts >= 0)) {
            throw new IllegalArgumentException("filamentKelvin and loopResistanceOhms must be positive, forwardVolts"
                    + " not negative");
        }
    }

    /** A plain resistive load of {@code ohms} with every other figure at its default. */
    public static ContactLoad resistive(double ohms) {
        return new ContactLoad(LoadKind.RESISTIVE, ohms, 0, 0, 0, 0, 2700, 0, 1, 2, 0);
    }

    /**
     * Cold-to-hot resistance ratio of a tungsten filament, R(hot)/R(cold) = (T_hot/T_cold)^1.2
     * (CT-6).
     */
    public static double tungstenResistanceRatio(double hotKelvin, double coldKelvin) {
        return Math.pow(hotKelvin / coldKelvin, TUNGSTEN_RESISTIVITY_EXPONENT);
    }

    /** Steady current from a rail of {@code railVolts} (RMS on AC), amperes. */
    public double steadyAmps(double railVolts) {
        double v = Math.abs(railVolts);
        if (kind == LoadKind.LED) {
            return Math.max(0, v - forwardVolts) / resistanceOhms;
        }
        return v / resistanceOhms;
    }

    /**
     * The resistance (|Z| for an AC motor or solenoid, the series resistor of an LED) at which this
     * load draws {@code watts} of real power from a rail of {@code railVolts}: V²/P; V²·cos φ/P on AC
     * for the inductive kinds; V·(V − VF)/P for an LED.
     *
     * @throws IllegalArgumentException if the power or the voltage left for the resistance is not positive
     */
    public double resistanceForPower(double railVolts, boolean ac, double watts) {
        double v = Math.abs(railVolts);
        if (!(watts > 0) || !(v > (kind == LoadKind.LED ? forwardVolts : 0))) {
            throw new IllegalArgumentException("a load of " + watts + " W on a " + v + " V rail has no resistance");
        }
        if (kind == LoadKind.LED) {
            return v * (v - forwardVolts) / watts;
        }
        return v * v * (ac ? powerFactor(true) : 1) / watts;
    }

    /** Real power drawn from a rail of {@code railVolts}, watts (cos φ on AC). */
    public double powerWatts(double railVolts, boolean ac) {
        double i = steadyAmps(railVolts);
        if (kind == LoadKind.LED) {
            return i * Math.abs(railVolts);
        }
        return Math.abs(railVolts) * i * (ac ? powerFactor(true) : 1);
    }

    /** cos φ of the load on AC (the user's or the kind's typical); 1 on DC. */
    public double powerFactor(boolean ac) {
        if (!ac) {
            return 1;
        }
        if (powerFactor > 0) {
            return powerFactor;
        }
        return switch (kind) {
            case MOTOR -> MOTOR_POWER_FACTOR;
            case SOLENOID -> SOLENOID_POWER_FACTOR;
            default -> 1;
        };
    }

    /**
     * Peak current at closing ÷ steady current, before the crest factor of AC: the user's figure
     * or the kind's typical one.
     *
     * @param ac the rail is AC
     * @param coldKelvin the filament's temperature before closing (the ambient), for a lamp
     * @param railVolts the rail voltage, for a capacitive load's loop-limited peak
     */
    public double inrushMultiple(boolean ac, double coldKelvin, double railVolts) {
        if (inrushMultiple > 0) {
            return inrushMultiple;
        }
        return switch (kind) {
            case RESISTIVE, LED -> 1;
            case LAMP -> Math.max(1, tungstenResistanceRatio(filamentKelvin, coldKelvin));
            case MOTOR -> MOTOR_INRUSH_MULTIPLE;
            case SOLENOID -> ac ? AC_SOLENOID_INRUSH_MULTIPLE : 1;
            case CAPACITIVE -> {
                double steady = steadyAmps(railVolts);
                double peak = crestVolts(railVolts, ac) / loopResistanceOhms;
                yield steady > 0 ? Math.max(1, peak / (steady * (ac ? Math.sqrt(2) : 1))) : 1;
            }
        };
    }

    /** Peak current at closing, amperes: crest factor × multiple × steady current. */
    public double inrushPeakAmps(double railVolts, boolean ac, double coldKelvin) {
        return (ac ? Math.sqrt(2) : 1) * inrushMultiple(ac, coldKelvin, railVolts) * steadyAmps(railVolts);
    }

    /** Time constant of the inrush's decay, seconds (0 for a kind with no inrush). */
    public double inrushSeconds(boolean ac, double railVolts) {
        if (inrushSeconds > 0) {
            return inrushSeconds;
        }
        return switch (kind) {
            case RESISTIVE, LED -> 0;
            case LAMP -> LAMP_INRUSH_SECONDS;
            case MOTOR -> MOTOR_INRUSH_SECONDS;
            case SOLENOID -> ac ? AC_SOLENOID_INRUSH_SECONDS : 0;
            case CAPACITIVE -> loopResistanceOhms * capacitance(railVolts, ac);
        };
    }

    /**
     * The envelope of the current after closing, i(t) = I·(1 + (m − 1)·e^(−t/τ)) (peak values on
     * AC), amperes.
     */
    public double inrushEnvelopeAmps(double seconds, double railVolts, boolean ac, double coldKelvin) {
        double steady = (ac ? Math.sqrt(2) : 1) * steadyAmps(railVolts);
        double m = inrushMultiple(ac, coldKelvin, railVolts);
        double tau = inrushSeconds(ac, railVolts);
        return tau > 0 ? steady * (1 + (m - 1) * Math.exp(-seconds / tau)) : steady;
    }

    /** Input capacitance of a capacitive load, farads (the user's, or per watt of its power). */
    public double capacitance(double railVolts, boolean ac) {
        if (capacitanceFarads > 0) {
            return capacitanceFarads;
        }
        double watts = ratedWatts > 0 ? ratedWatts : powerWatts(railVolts, ac);
        return CAPACITIVE_FARADS_PER_WATT * watts;
    }

    /** Series resistance of the load at break, ohms (R on DC; |Z|·cos φ on AC). */
    public double breakResistanceOhms(boolean ac) {
        return ac ? resistanceOhms * powerFactor(true) : resistanceOhms;
    }

    /** Series inductance of the load at break, henries; 0 for the kinds that are not inductive. */
    public double breakInductanceHenries(double railVolts, boolean ac) {
        if (!kind.inductive()) {
            return 0;
        }
        if (ac) {
            double pf = powerFactor(true);
            return resistanceOhms * Math.sqrt(1 - pf * pf) / (2 * Math.PI * MAINS_HERTZ);
        }
        if (inductanceHenries > 0) {
            return inductanceHenries;
        }
        double watts = ratedWatts > 0 ? ratedWatts : powerWatts(railVolts, false);
        double tau = Math.min(DC_TIME_CONSTANT_MAX_SECONDS, DC_TIME_CONSTANT_SECONDS_PER_WATT * watts);
        return tau * resistanceOhms;
    }

    private static double crestVolts(double railVolts, boolean ac) {
        return Math.abs(railVolts) * (ac ? Math.sqrt(2) : 1);
    }
}
