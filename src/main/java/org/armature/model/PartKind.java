package org.armature.model;

import java.util.List;
import java.util.Optional;
import org.armature.units.Unit;

/**
 * The kinds of part the editor allows: only what relay driver stages contain.
 *
 * <p>Each kind lists its pins (with their offsets in the unrotated symbol, in grid units), its numeric
 * parameters with units, ranges and typical defaults, and its choice settings. Defaults describe a
 * generic part of the class named in {@link #description()}; they are typical values, not limits of
 * any particular product, and users replace them with their datasheet's figures.
 *
 * <p>One-pin kinds ({@link #DRIVE_PIN}, {@link #SUPPLY}) are referenced to the {@code gnd} net.
 */
public enum PartKind {

    /** A logic-level output pin: a Thevenin source between its high and low levels. */
    DRIVE_PIN("U", "Logic drive pin",
            "Microcontroller or logic output, modelled as a source with output resistance (typical 3.3 V CMOS output).",
            List.of(pin("out", 2, 0, "output")),
            List.of(
                    p(ParamKeys.HIGH_VOLTS, "High level (open circuit)", Unit.VOLT, 3.5, 0, 60,
                            "Thevenin voltage of the high level; fit it with VOH at two currents from the datasheet."),
                    p(ParamKeys.LOW_VOLTS, "Low level (open circuit)", Unit.VOLT, 0, -1, 60, "Thevenin voltage of the low level."),
                    p(ParamKeys.OUTPUT_RESISTANCE_OHMS, "Output resistance", Unit.OHM, 75, 0.01, 1e6,
                            "Thevenin resistance of the output (typical 3.3 V microcontroller pin: 75 Ω)."),
                    p(ParamKeys.HIGH_TOLERANCE_VOLTS, "High level spread", Unit.VOLT, 0.1, 0, 10,
                            "How far the open-circuit high level may fall below nominal at the worst corner."),
                    p(ParamKeys.PIN_CURRENT_LIMIT_AMPS, "Pin current limit", Unit.AMPERE, 0.020, 1e-6, 1,
                            "Largest current the datasheet allows per pin (many pins: 20 mA, some 40 mA)."),
                    p(ParamKeys.PACKAGE_CURRENT_LIMIT_AMPS, "Package current limit", Unit.AMPERE, 0.100, 1e-6, 10,
                            "Largest total current of all pins of the device."),
                    p(ParamKeys.CHANNEL_COUNT, "Channels driven", Unit.RATIO, 1, 1, 64,
                            "How many identical stages this device drives at once (for the package budget).")),
            List.of()),

    /** A DC supply rail referenced to ground. */
    SUPPLY("V", "Supply rail", "DC rail referenced to ground (coil supply or contact-side supply).",
            List.of(pin("p", 0, 0, "rail")),
            List.of(
                    p(ParamKeys.VOLTS, "Voltage", Unit.VOLT, 12, -1000, 1000, "Nominal rail voltage."),
                    p(ParamKeys.TOLERANCE_PERCENT, "Tolerance", Unit.PERCENT, 10, 0, 50,
                            "Rail tolerance used by the corner checks (±).")),
            List.of(new OptionSpec(ParamKeys.WAVEFORM, "Waveform", List.of("dc", "ac-rms"),
                    "ac-rms marks a mains or AC contact side: the value is the RMS voltage. The solver uses it as DC."))),

    /** The common reference, net {@code gnd}. */
    GROUND("GND", "Ground", "Common reference (0 V).",
            List.of(pin("g", 0, 0, "ground")), List.of(), List.of()),

    /** A fixed resistor. */
    RESISTOR("R", "Resistor", "Fixed film resistor (typical 0.25 W, ±5 %).",
            List.of(pin("a", 0, -2, "end a"), pin("b", 0, 2, "end b")),
            List.of(
                    p(ParamKeys.RESISTANCE_OHMS, "Resistance", Unit.OHM, 10_000, 1e-3, 1e12, "Nominal resistance."),
                    p(ParamKeys.TOLERANCE_PERCENT, "Tolerance", Unit.PERCENT, 5, 0, 50,
                            "Manufacturing tolerance; E24 parts are ±5 %, E96 ±1 % (IEC 60063)."),
                    p(ParamKeys.POWER_RATING_WATTS, "Power rating", Unit.WATT, 0.25, 1e-3, 100, "Rated dissipation.")),
            List.of()),

    /** A rectifier or signal diode. */
    DIODE("D", "Diode", "General-purpose silicon rectifier, axial (typical values).",
            List.of(pin("a", 0, -2, "anode"), pin("k", 0, 2, "cathode")),
            junctionParams(1e-9, 1.8, 0.05, 100, 1e-5, 1.0, 1.0),
            List.of()),

    /** A zener diode; its breakdown is the clamp. */
    ZENER("D", "Zener diode", "Zener diode, 0.5 W class (typical values).",
            List.of(pin("a", 0, -2, "anode"), pin("k", 0, 2, "cathode")),
            junctionParams(1e-12, 1.0, 0.5, 12, 5e-3, 0.2, 0.5),
            List.of()),

    /** A bidirectional transient voltage suppressor. */
    TVS("D", "TVS diode", "Bidirectional transient voltage suppressor, 400 W class (typical values).",
            List.of(pin("a", 0, -2, "terminal 1"), pin("b", 0, 2, "terminal 2")),
            List.of(
                    p(ParamKeys.BREAKDOWN_VOLTS, "Breakdown voltage", Unit.VOLT, 24, 1, 1000, "Breakdown voltage at the test current."),
                    p(ParamKeys.BREAKDOWN_CURRENT_AMPS, "Test current", Unit.AMPERE, 1e-3, 1e-9, 1, "Current at which the breakdown voltage is stated."),
                    p(ParamKeys.CLAMP_RESISTANCE_OHMS, "Dynamic resistance", Unit.OHM, 0.5, 1e-4, 1000,
                            "Slope of the clamp above breakdown."),
                    p(ParamKeys.PEAK_PULSE_POWER_WATTS, "Peak pulse power", Unit.WATT, 400, 1, 1e5, "Rated peak pulse power.")),
            List.of()),

    /** A capacitor (for an RC snubber). */
    CAPACITOR("C", "Capacitor", "Film capacitor for an RC snubber (typical values).",
            List.of(pin("a", 0, -2, "terminal 1"), pin("b", 0, 2, "terminal 2")),
            List.of(
                    p(ParamKeys.CAPACITANCE_FARADS, "Capacitance", Unit.FARAD, 100e-9, 1e-15, 1, "Nominal capacitance."),
                    p(ParamKeys.RATED_VOLTS, "Rated voltage", Unit.VOLT, 100, 1, 10_000, "Rated DC voltage.")),
            List.of()),

    /** An indicator LED, fitted from its forward voltage at a stated current. */
    LED("D", "LED", "Indicator LED, 3 mm (typical values).",
            List.of(pin("a", 0, -2, "anode"), pin("k", 0, 2, "cathode")),
            List.of(
                    p(ParamKeys.FORWARD_VOLTS, "Forward voltage", Unit.VOLT, 2.0, 0.5, 10, "Forward voltage at the stated current."),
                    p(ParamKeys.FORWARD_CURRENT_AMPS, "At current", Unit.AMPERE, 0.010, 1e-6, 1, "Current at which the forward voltage is stated."),
                    p(ParamKeys.EMISSION_COEFFICIENT, "Emission coefficient", Unit.RATIO, 2.0, 0.5, 10, "Ideality factor N of the fitted junction."),
                    p(ParamKeys.MAX_CURRENT_AMPS, "Maximum current", Unit.AMPERE, 0.020, 1e-6, 1, "Rated continuous forward current.")),
            List.of()),

    /** An NPN bipolar transistor. */
    NPN("Q", "NPN transistor", "General-purpose small-signal NPN, TO-92 (typical values).",
            List.of(pin("b", -2, 0, "base"), pin("c", 1, -2, "collector"), pin("e", 1, 2, "emitter")),
            bjtParams(), List.of()),

    /** A PNP bipolar transistor. */
    PNP("Q", "PNP transistor", "General-purpose small-signal PNP, TO-92 (typical values).",
            List.of(pin("b", -2, 0, "base"), pin("e", 1, -2, "emitter"), pin("c", 1, 2, "collector")),
            bjtParams(), List.of()),

    /** An N-channel enhancement MOSFET with its body diode. */
    NMOS("Q", "N-channel MOSFET", "Logic-level small-signal N-channel MOSFET, SOT-23 (typical values).",
            List.of(pin("g", -2, 0, "gate"), pin("d", 1, -2, "drain"), pin("s", 1, 2, "source")),
            List.of(
                    p(ParamKeys.THRESHOLD_VOLTS, "Threshold VT0", Unit.VOLT, 1.2, 0.1, 10, "Shichman–Hodges threshold voltage (model)."),
                    p(ParamKeys.TRANSCONDUCTANCE_AMPS_PER_VOLT_SQUARED, "β (KP)", Unit.AMPERE_PER_VOLT_SQUARED, 0.25, 1e-6, 1000,
                            "Shichman–Hodges β: ID = β/2·(VGS − VT0)² in saturation."),
                    p(ParamKeys.LAMBDA_PER_VOLT, "λ", Unit.PER_VOLT, 0.01, 0, 1, "Channel-length modulation."),
                    p(ParamKeys.THRESHOLD_TEMPCO_VOLTS_PER_KELVIN, "Threshold tempco", Unit.VOLT_PER_KELVIN, -0.004, -0.05, 0.05,
                            "Change of threshold with temperature (typical −4 mV/K)."),
                    p(ParamKeys.VGS_TH_MAX_VOLTS, "VGS(th) max", Unit.VOLT, 1.5, 0.1, 10, "Datasheet maximum gate threshold voltage."),
                    p(ParamKeys.RDS_ON_OHMS, "RDS(on) max", Unit.OHM, 3.0, 1e-4, 1e4, "Datasheet maximum on-resistance at the stated gate voltage."),
                    p(ParamKeys.RDS_ON_GATE_VOLTS, "RDS(on) at VGS", Unit.VOLT, 2.5, 0.5, 20, "Gate voltage at which RDS(on) is specified."),
                    p(ParamKeys.VDSS_VOLTS, "VDSS", Unit.VOLT, 60, 1, 2000, "Drain–source breakdown rating."),
                    p(ParamKeys.ID_MAX_AMPS, "ID max", Unit.AMPERE, 0.3, 1e-4, 1000, "Continuous drain current rating."),
                    p(ParamKeys.THERMAL_RESISTANCE_KELVIN_PER_WATT, "RθJA", Unit.KELVIN_PER_WATT, 350, 0.1, 2000, "Junction-to-ambient thermal resistance."),
                    p(ParamKeys.TJ_MAX_CELSIUS, "Tj max", Unit.CELSIUS, 150, 50, 250, "Maximum junction temperature.")),
            List.of()),

    /** One channel of a seven-channel Darlington array, with input resistor and clamp diode. */
    DARLINGTON("U", "Darlington array channel",
            "One channel of a 7-channel Darlington sink array, DIP-16 (typical values).",
            List.of(pin("in", -3, 0, "input"), pin("out", 1, -3, "output (collector)"),
                    pin("com", 3, -3, "clamp common"), pin("e", 1, 3, "emitter / array ground")),
            List.of(
                    p(ParamKeys.INPUT_RESISTANCE_OHMS, "Input resistor", Unit.OHM, 2700, 1, 1e6, "Series input resistor inside the channel."),
                    p(ParamKeys.FIRST_BASE_EMITTER_OHMS, "Q1 base–emitter resistor", Unit.OHM, 7200, 1, 1e7, "Resistor across the first transistor's base–emitter."),
                    p(ParamKeys.SECOND_BASE_EMITTER_OHMS, "Q2 base–emitter resistor", Unit.OHM, 3000, 1, 1e7, "Resistor across the output transistor's base–emitter."),
                    p(ParamKeys.SATURATION_CURRENT_AMPS, "IS", Unit.AMPERE, 3e-14, 1e-18, 1e-6, "Saturation current of each transistor (model)."),
                    p(ParamKeys.BETA_FORWARD, "βF (each)", Unit.RATIO, 100, 1, 10_000, "Forward current gain of each transistor (model)."),
                    p(ParamKeys.HFE_MIN, "Channel hFE min", Unit.RATIO, 1000, 1, 1e6, "Datasheet minimum gain of the channel."),
                    p(ParamKeys.COLLECTOR_RESISTANCE_OHMS, "Output resistance", Unit.OHM, 1.3, 0, 100, "Collector series resistance of the output transistor."),
                    p(ParamKeys.VCEO_VOLTS, "VCE max", Unit.VOLT, 50, 1, 1000, "Output sustaining voltage rating."),
                    p(ParamKeys.IC_MAX_AMPS, "Output current max", Unit.AMPERE, 0.5, 1e-3, 10, "Rated output current per channel."),
                    p(ParamKeys.CHANNEL_COUNT, "Channels on", Unit.RATIO, 1, 1, 8, "Channels of the same package on at once (thermal check)."),
                    p(ParamKeys.THERMAL_RESISTANCE_KELVIN_PER_WATT, "Package RθJA", Unit.KELVIN_PER_WATT, 67, 0.1, 1000, "Package junction-to-ambient thermal resistance."),
                    p(ParamKeys.TJ_MAX_CELSIUS, "Tj max", Unit.CELSIUS, 150, 50, 250, "Maximum junction temperature.")),
            List.of()),

    /** A relay: coil between A1 and A2, and one changeover contact set linked to it. */
    RELAY("K", "Relay", "Small PCB power relay, sealed, one changeover contact (typical values).",
            List.of(pin("a1", 0, -2, "coil A1"), pin("a2", 0, 2, "coil A2"),
                    pin("com", 5, -2, "contact common"), pin("nc", 4, 2, "normally closed"),
                    pin("no", 6, 2, "normally open")),
            List.of(
                    p(ParamKeys.RATED_VOLTS, "Rated coil voltage", Unit.VOLT, 12, 0.5, 500, "Nominal coil voltage."),
                    p(ParamKeys.COIL_RESISTANCE_OHMS, "Coil resistance", Unit.OHM, 400, 0.1, 1e6, "Coil resistance at the reference temperature."),
                    p(ParamKeys.COIL_RESISTANCE_TOLERANCE_PERCENT, "Coil resistance tolerance", Unit.PERCENT, 10, 0, 50, "± spread of coil resistance (typical ±10 %)."),
                    p(ParamKeys.MUST_OPERATE_VOLTS, "Must-operate voltage", Unit.VOLT, 9.0, 0.01, 500,
                            "Highest coil voltage at which every sample operates, at the reference temperature (typical ≤ 75 % of rated)."),
                    p(ParamKeys.MUST_RELEASE_VOLTS, "Must-release voltage", Unit.VOLT, 1.2, 0.001, 500,
                            "Lowest coil voltage at which every sample releases, at the reference temperature (typical ≥ 10 % of rated)."),
                    p(ParamKeys.REFERENCE_TEMPERATURE_CELSIUS, "Reference temperature", Unit.CELSIUS, 20, -60, 150,
                            "Temperature at which the datasheet coil values hold."),
                    p(ParamKeys.COIL_THERMAL_RESISTANCE_KELVIN_PER_WATT, "Coil thermal resistance", Unit.KELVIN_PER_WATT, 100, 0, 10_000,
                            "Coil temperature rise per watt of coil power; 0 means no self-heating."),
                    p(ParamKeys.INDUCTANCE_RELEASED_HENRIES, "Inductance, released", Unit.HENRY, 1.2, 1e-6, 100, "Coil inductance with the armature released."),
                    p(ParamKeys.INDUCTANCE_ATTRACTED_HENRIES, "Inductance, attracted", Unit.HENRY, 0, 0, 100,
                            "Coil inductance with the armature attracted; 0 means constant inductance."),
                    p(ParamKeys.COIL_CAPACITANCE_FARADS, "Coil self-capacitance", Unit.FARAD, 100e-12, 0, 1e-6, "Self-capacitance across the winding."),
                    p(ParamKeys.CORE_LOSS_OHMS, "Core-loss resistance", Unit.OHM, 0, 0, 1e9, "Parallel resistance for core losses; 0 means none."),
                    p(ParamKeys.OPERATE_TIME_SECONDS, "Operate time", Unit.SECOND, 0.008, 0, 1,
                            "Datasheet operate time; sets the transit with constant inductance (no attracted inductance)."),
                    p(ParamKeys.RELEASE_TIME_SECONDS, "Release time", Unit.SECOND, 0.004, 0, 1,
                            "Datasheet release time without suppressor; sets the transit with constant inductance."),
                    p(ParamKeys.TRAVEL_METRES, "Armature travel", Unit.METRE, 0.3e-3, 1e-6, 0.01, "Armature travel between released and attracted."),
                    p(ParamKeys.SPRING_FORCE_RATIO, "Spring force ratio", Unit.RATIO, 2, 1.01, 20,
                            "Spring force attracted ÷ released (typical 1.5–3, from memory)."),
                    p(ParamKeys.ARMATURE_MASS_GRAMS, "Armature mass", Unit.GRAM, 1, 0.01, 100,
                            "Effective moving mass of armature and contact spring (typical about 1 g for a small PCB relay); "
                                    + "sets the flight time with an attracted inductance."),
                    p(ParamKeys.ARMATURE_DAMPING_NEWTON_SECONDS_PER_METRE, "Armature damping", Unit.NEWTON_SECOND_PER_METRE, 0.1, 0, 100,
                            "Viscous damping of the armature's motion (default 0.1 N·s/m: light air and pivot damping)."),
                    p(ParamKeys.CONTACT_RATED_VOLTS, "Contact AC rating, voltage", Unit.VOLT, 250, 1, 1000,
                            "Contact switching voltage rating for AC (RMS), for a resistive load (typical 250 V)."),
                    p(ParamKeys.CONTACT_RATED_AMPS, "Contact AC rating, current", Unit.AMPERE, 10, 1e-3, 100,
                            "Contact switching current rating for AC (RMS), for a resistive load (typical 10 A)."),
                    p(ParamKeys.CONTACT_RATED_DC_VOLTS, "Contact DC rating, voltage", Unit.VOLT, 30, 1, 1000,
                            "Contact switching voltage rating for DC; far below the AC rating, since a DC arc has no"
                                    + " current zero (typical 30 V, CT-4)."),
                    p(ParamKeys.CONTACT_RATED_DC_AMPS, "Contact DC rating, current", Unit.AMPERE, 10, 1e-3, 100,
                            "Contact switching current rating for DC at the DC rated voltage (typical 10 A)."),
                    p(ParamKeys.CONTACT_MAKE_AMPS, "Contact make (inrush) rating", Unit.AMPERE, 30, 1e-3, 1000,
                            "Peak current the contacts may make at closing (typical 30 A for a 10 A relay, from memory)."),
                    p(ParamKeys.MAX_COIL_VOLTAGE_PERCENT, "Maximum allowable coil voltage", Unit.PERCENT, 130, 100, 500,
                            "Highest continuous coil voltage as a percentage of rated, at the reference temperature"
                                    + " (datasheets: often 110–180 %; typical 130 %, CT-3)."),
                    p(ParamKeys.INSULATION_CLASS_CELSIUS, "Coil insulation class", Unit.CELSIUS, 130, 90, 250,
                            "Temperature limit of the coil's insulation thermal class (IEC 60085: Y 90, A 105, E 120, B 130,"
                                    + " F 155, H 180, N 200, R 220 °C; typical class B, 130 °C)."),
                    p(ParamKeys.MIN_ARC_VOLTS, "Minimum arc voltage", Unit.VOLT, 12, 0, 1000,
                            "Voltage across parting contacts below which no arc forms (typical 12 V for silver-alloy"
                                    + " contacts, from memory, CT-9)."),
                    p(ParamKeys.MIN_ARC_AMPS, "Minimum arc current", Unit.AMPERE, 0.4, 0, 100,
                            "Current below which no arc forms at the parting contacts (typical 0.4 A for silver-alloy"
                                    + " contacts, from memory, CT-9)."),
                    p(ParamKeys.CONTACT_WITHSTAND_VOLTS, "Open-contact withstand", Unit.VOLT, 1000, 10, 10_000,
                            "Voltage the open contact gap holds off (datasheets: dielectric strength between open contacts;"
                                    + " typical 1,000 V, from memory); a break that rings above it arcs over.")),
            List.of()),

    /**
     * What the contacts switch: a resistive load, an incandescent lamp, a motor, a solenoid or
     * contactor coil, a capacitive load (a power supply's input) or an LED with its resistor. The
     * physics of each kind is in {@code devices.ContactLoad}.
     */
    LOAD("E", "Contact-side load", "Load switched by the relay contacts.",
            List.of(pin("a", 0, -2, "terminal 1"), pin("b", 0, 2, "terminal 2")),
            List.of(
                    p(ParamKeys.RESISTANCE_OHMS, "Resistance", Unit.OHM, 48, 1e-3, 1e9,
                            "Steady load resistance when on (a lamp: hot filament; an AC motor or solenoid: the"
                                    + " impedance |Z| = V/I; an LED: its series resistor)."),
                    p(ParamKeys.RATED_WATTS, "Rated power", Unit.WATT, 3, 0, 1e5,
                            "Rated load power at the contact-side rail, for the plausibility check (0: not given)."),
                    p(ParamKeys.INRUSH_MULTIPLE, "Inrush multiple", Unit.RATIO, 0, 0, 1000,
                            "Peak current at closing ÷ steady current; 0 takes the kind's typical value (lamp: tungsten law;"
                                    + " motor ×6; AC solenoid ×10; capacitive: from the loop resistance; common practice, CT-5)."),
                    p(ParamKeys.INRUSH_SECONDS, "Inrush duration", Unit.SECOND, 0, 0, 10,
                            "Time constant of the inrush decay; 0 takes the kind's typical value (common practice)."),
                    p(ParamKeys.POWER_FACTOR, "Power factor", Unit.RATIO, 0, 0, 1,
                            "cos φ of an AC motor or solenoid; 0 takes the kind's typical value (motor 0.8, solenoid 0.4)."),
                    p(ParamKeys.INDUCTANCE_HENRIES, "Inductance", Unit.HENRY, 0, 0, 1000,
                            "Inductance of a DC motor or solenoid; 0 takes L/R = 2 ms per watt (time constant of the"
                                    + " IEC 60947-5-1 DC-13 test load, T0.95 ≈ 6·P ms, from memory)."),
                    p(ParamKeys.FILAMENT_KELVIN, "Filament temperature", Unit.KELVIN, 2700, 1000, 3600,
                            "Hot filament temperature of a lamp (typical 2,700 K for a general-service lamp)."),
                    p(ParamKeys.CAPACITANCE_FARADS, "Input capacitance", Unit.FARAD, 0, 0, 1,
                            "Input capacitance of a capacitive load; 0 takes 2 µF per watt (typical bulk capacitor, from memory)."),
                    p(ParamKeys.LOOP_RESISTANCE_OHMS, "Loop resistance", Unit.OHM, 1, 1e-3, 1e4,
                            "Source plus wiring resistance that limits a capacitive inrush (typical 1 Ω)."),
                    p(ParamKeys.FORWARD_VOLTS, "LED forward voltage", Unit.VOLT, 2, 0, 60,
                            "Forward voltage of an LED load, in series with its resistor (typical 2 V).")),
            List.of(new OptionSpec(ParamKeys.LOAD_KIND, "Kind", List.of("resistive", "lamp", "motor", "solenoid", "capacitive", "led"),
                    "What the load is: a lamp draws 10–15 times its hot current when cold; a motor its locked-rotor"
                            + " current; a solenoid or contactor coil is inductive at break; a capacitive load charges"
                            + " through the loop resistance.")));

    private final String designatorPrefix;
    private final String title;
    private final String description;
    private final List<PinSpec> pins;
    private final List<ParamSpec> params;
    private final List<OptionSpec> options;

    PartKind(String designatorPrefix, String title, String description, List<PinSpec> pins,
             List<ParamSpec> params, List<OptionSpec> options) {
        this.designatorPrefix = designatorPrefix;
        this.title = title;
        this.description = description;
        this.pins = List.copyOf(pins);
        this.params = List.copyOf(params);
        this.options = List.copyOf(options);
    }

    /** Reference designator prefix as the trade uses it (R, D, Q, K, U, V). */
    public String designatorPrefix() {
        return designatorPrefix;
    }

    /** Short human name of the kind. */
    public String title() {
        return title;
    }

    /** The generic part class the defaults describe. */
    public String description() {
        return description;
    }

    /** Pins in their unrotated positions. */
    public List<PinSpec> pins() {
        return pins;
    }

    /** Numeric parameters. */
    public List<ParamSpec> params() {
        return params;
    }

    /** Choice settings. */
    public List<OptionSpec> options() {
        return options;
    }

    /** The pin with this name, if the kind has one. */
    public Optional<PinSpec> pin(String name) {
        return pins.stream().filter(p -> p.name().equals(name)).findFirst();
    }

    /** The parameter with this key, if the kind has one. */
    public Optional<ParamSpec> param(String key) {
        // a plain loop: Part.value falls back here for every default, thousands of times per check run
        for (ParamSpec p : params) {
            if (p.key().equals(key)) {
                return Optional.of(p);
            }
        }
        return Optional.empty();
    }

    /** The option with this key, if the kind has one. */
    public Optional<OptionSpec> option(String key) {
        return options.stream().filter(o -> o.key().equals(key)).findFirst();
    }

    /** True for the kinds that carry the coil current as the switch (Q1 candidates). */
    public boolean isSwitch() {
        return this == NPN || this == PNP || this == NMOS || this == DARLINGTON;
    }

    /** True for kinds that may serve as a coil suppressor. */
    public boolean isSuppressorKind() {
        return this == DIODE || this == ZENER || this == TVS || this == CAPACITOR || this == RESISTOR;
    }

    private static PinSpec pin(String name, int x, int y, String description) {
        return new PinSpec(name, x, y, description);
    }

    private static ParamSpec p(String key, String label, Unit unit, double def, double min, double max,
                               String description) {
        return new ParamSpec(key, label, unit, def, min, max, description);
    }

    private static List<ParamSpec> junctionParams(double is, double n, double rs, double bv, double ibv,
                                                  double ifMax, double pMax) {
        return List.of(
                p(ParamKeys.SATURATION_CURRENT_AMPS, "IS", Unit.AMPERE, is, 1e-20, 1e-3, "Shockley saturation current (model)."),
                p(ParamKeys.EMISSION_COEFFICIENT, "N", Unit.RATIO, n, 0.5, 10, "Emission coefficient (model)."),
                p(ParamKeys.SERIES_RESISTANCE_OHMS, "Series resistance", Unit.OHM, rs, 0, 1e4, "Ohmic series resistance (model)."),
                p(ParamKeys.BREAKDOWN_VOLTS, "Reverse breakdown", Unit.VOLT, bv, 0.5, 5000,
                        "Reverse breakdown voltage (a zener's VZ; a rectifier's reverse rating)."),
                p(ParamKeys.BREAKDOWN_CURRENT_AMPS, "Breakdown test current", Unit.AMPERE, ibv, 1e-12, 10,
                        "Reverse current at which the breakdown voltage is stated."),
                p(ParamKeys.MAX_CURRENT_AMPS, "Peak current rating", Unit.AMPERE, ifMax, 1e-4, 1000, "Repetitive peak current rating."),
                p(ParamKeys.POWER_RATING_WATTS, "Power rating", Unit.WATT, pMax, 1e-3, 1000, "Rated dissipation."));
    }

    private static List<ParamSpec> bjtParams() {
        return List.of(
                p(ParamKeys.SATURATION_CURRENT_AMPS, "IS", Unit.AMPERE, 1e-14, 1e-20, 1e-6, "Transport saturation current (model)."),
                p(ParamKeys.BETA_FORWARD, "βF", Unit.RATIO, 200, 1, 10_000, "Ideal forward gain of the model (typical hFE)."),
                p(ParamKeys.BETA_REVERSE, "βR", Unit.RATIO, 2, 0.01, 1000, "Reverse gain (model)."),
                p(ParamKeys.EARLY_VOLTS, "VAF", Unit.VOLT, 100, 1, 10_000, "Forward Early voltage (model)."),
                p(ParamKeys.KNEE_CURRENT_AMPS, "IKF", Unit.AMPERE, 0.3, 1e-4, 100, "High-injection knee current (model): gain falls above it."),
                p(ParamKeys.BASE_RESISTANCE_OHMS, "RB", Unit.OHM, 10, 0, 1e4, "Base spreading resistance (model)."),
                p(ParamKeys.COLLECTOR_RESISTANCE_OHMS, "RC", Unit.OHM, 1, 0, 1e3, "Collector series resistance (model)."),
                p(ParamKeys.EMITTER_RESISTANCE_OHMS, "RE", Unit.OHM, 0.2, 0, 1e3, "Emitter series resistance (model)."),
                p(ParamKeys.GAIN_TEMP_EXPONENT, "XTB", Unit.RATIO, 1.5, 0, 10, "Gain temperature exponent: βF·(T/Tnom)^XTB (from memory)."),
                p(ParamKeys.HFE_MIN, "hFE min", Unit.RATIO, 100, 1, 1e5, "Datasheet minimum DC gain at the relevant collector current."),
                p(ParamKeys.VBE_SAT_VOLTS, "VBE(sat) max", Unit.VOLT, 0.95, 0.3, 3, "Datasheet maximum VBE(sat) at IC/IB = 10."),
                p(ParamKeys.VCE_SAT_VOLTS, "VCE(sat) max", Unit.VOLT, 0.3, 0.01, 5, "Datasheet maximum VCE(sat) at IC/IB = 10."),
                p(ParamKeys.VCEO_VOLTS, "VCEO", Unit.VOLT, 40, 1, 2000, "Collector–emitter breakdown rating (base open)."),
                p(ParamKeys.IC_MAX_AMPS, "IC max", Unit.AMPERE, 0.6, 1e-4, 100, "Continuous collector current rating."),
                p(ParamKeys.THERMAL_RESISTANCE_KELVIN_PER_WATT, "RθJA", Unit.KELVIN_PER_WATT, 200, 0.1, 2000,
                        "Junction-to-ambient thermal resistance (TO-92 typical 200 °C/W)."),
                p(ParamKeys.TJ_MAX_CELSIUS, "Tj max", Unit.CELSIUS, 150, 50, 250, "Maximum junction temperature."));
    }
}
