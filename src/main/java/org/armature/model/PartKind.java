package org.armature.model;

import java.util.List;
import java.util.Optional;

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
                    p("highVolts", "High level (open circuit)", "V", 3.5, 0, 60,
                            "Thevenin voltage of the high level; fit it with VOH at two currents from the datasheet."),
                    p("lowVolts", "Low level (open circuit)", "V", 0, -1, 60, "Thevenin voltage of the low level."),
                    p("outputResistanceOhms", "Output resistance", "Ω", 75, 0.01, 1e6,
                            "Thevenin resistance of the output (typical 3.3 V microcontroller pin: 75 Ω)."),
                    p("highToleranceVolts", "High level spread", "V", 0.1, 0, 10,
                            "How far the open-circuit high level may fall below nominal at the worst corner."),
                    p("pinCurrentLimitAmps", "Pin current limit", "A", 0.020, 1e-6, 1,
                            "Largest current the datasheet allows per pin (many pins: 20 mA, some 40 mA)."),
                    p("packageCurrentLimitAmps", "Package current limit", "A", 0.100, 1e-6, 10,
                            "Largest total current of all pins of the device."),
                    p("channelCount", "Channels driven", "", 1, 1, 64,
                            "How many identical stages this device drives at once (for the package budget).")),
            List.of()),

    /** A DC supply rail referenced to ground. */
    SUPPLY("V", "Supply rail", "DC rail referenced to ground (coil supply or contact-side supply).",
            List.of(pin("p", 0, 0, "rail")),
            List.of(
                    p("volts", "Voltage", "V", 12, -1000, 1000, "Nominal rail voltage."),
                    p("tolerancePercent", "Tolerance", "%", 10, 0, 50,
                            "Rail tolerance used by the corner checks (±).")),
            List.of(new OptionSpec("waveform", "Waveform", List.of("dc", "ac-rms"),
                    "ac-rms marks a mains or AC contact side: the value is the RMS voltage. The solver uses it as DC."))),

    /** The common reference, net {@code gnd}. */
    GROUND("GND", "Ground", "Common reference (0 V).",
            List.of(pin("g", 0, 0, "ground")), List.of(), List.of()),

    /** A fixed resistor. */
    RESISTOR("R", "Resistor", "Fixed film resistor (typical 0.25 W, ±5 %).",
            List.of(pin("a", 0, -2, "end a"), pin("b", 0, 2, "end b")),
            List.of(
                    p("resistanceOhms", "Resistance", "Ω", 10_000, 1e-3, 1e12, "Nominal resistance."),
                    p("tolerancePercent", "Tolerance", "%", 5, 0, 50,
                            "Manufacturing tolerance; E24 parts are ±5 %, E96 ±1 % (IEC 60063)."),
                    p("powerRatingWatts", "Power rating", "W", 0.25, 1e-3, 100, "Rated dissipation.")),
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
                    p("breakdownVolts", "Breakdown voltage", "V", 24, 1, 1000, "Breakdown voltage at the test current."),
                    p("breakdownCurrentAmps", "Test current", "A", 1e-3, 1e-9, 1, "Current at which the breakdown voltage is stated."),
                    p("clampResistanceOhms", "Dynamic resistance", "Ω", 0.5, 1e-4, 1000,
                            "Slope of the clamp above breakdown."),
                    p("peakPulsePowerWatts", "Peak pulse power", "W", 400, 1, 1e5, "Rated peak pulse power.")),
            List.of()),

    /** A capacitor (for an RC snubber). */
    CAPACITOR("C", "Capacitor", "Film capacitor for an RC snubber (typical values).",
            List.of(pin("a", 0, -2, "terminal 1"), pin("b", 0, 2, "terminal 2")),
            List.of(
                    p("capacitanceFarads", "Capacitance", "F", 100e-9, 1e-15, 1, "Nominal capacitance."),
                    p("ratedVolts", "Rated voltage", "V", 100, 1, 10_000, "Rated DC voltage.")),
            List.of()),

    /** An indicator LED, fitted from its forward voltage at a stated current. */
    LED("D", "LED", "Indicator LED, 3 mm (typical values).",
            List.of(pin("a", 0, -2, "anode"), pin("k", 0, 2, "cathode")),
            List.of(
                    p("forwardVolts", "Forward voltage", "V", 2.0, 0.5, 10, "Forward voltage at the stated current."),
                    p("forwardCurrentAmps", "At current", "A", 0.010, 1e-6, 1, "Current at which the forward voltage is stated."),
                    p("emissionCoefficient", "Emission coefficient", "", 2.0, 0.5, 10, "Ideality factor N of the fitted junction."),
                    p("maxCurrentAmps", "Maximum current", "A", 0.020, 1e-6, 1, "Rated continuous forward current.")),
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
                    p("thresholdVolts", "Threshold VT0", "V", 1.2, 0.1, 10, "Shichman–Hodges threshold voltage (model)."),
                    p("transconductanceAmpsPerVoltSquared", "β (KP)", "A/V²", 0.25, 1e-6, 1000,
                            "Shichman–Hodges β: ID = β/2·(VGS − VT0)² in saturation."),
                    p("lambdaPerVolt", "λ", "1/V", 0.01, 0, 1, "Channel-length modulation."),
                    p("thresholdTempcoVoltsPerKelvin", "Threshold tempco", "V/K", -0.004, -0.05, 0.05,
                            "Change of threshold with temperature (typical −4 mV/K)."),
                    p("vgsThMaxVolts", "VGS(th) max", "V", 1.5, 0.1, 10, "Datasheet maximum gate threshold voltage."),
                    p("rdsOnOhms", "RDS(on) max", "Ω", 3.0, 1e-4, 1e4, "Datasheet maximum on-resistance at the stated gate voltage."),
                    p("rdsOnGateVolts", "RDS(on) at VGS", "V", 2.5, 0.5, 20, "Gate voltage at which RDS(on) is specified."),
                    p("vdssVolts", "VDSS", "V", 60, 1, 2000, "Drain–source breakdown rating."),
                    p("idMaxAmps", "ID max", "A", 0.3, 1e-4, 1000, "Continuous drain current rating."),
                    p("thermalResistanceKelvinPerWatt", "RθJA", "K/W", 350, 0.1, 2000, "Junction-to-ambient thermal resistance."),
                    p("tjMaxCelsius", "Tj max", "°C", 150, 50, 250, "Maximum junction temperature.")),
            List.of()),

    /** One channel of a seven-channel Darlington array, with input resistor and clamp diode. */
    DARLINGTON("U", "Darlington array channel",
            "One channel of a 7-channel Darlington sink array, DIP-16 (typical values).",
            List.of(pin("in", -3, 0, "input"), pin("out", 1, -3, "output (collector)"),
                    pin("com", 3, -3, "clamp common"), pin("e", 1, 3, "emitter / array ground")),
            List.of(
                    p("inputResistanceOhms", "Input resistor", "Ω", 2700, 1, 1e6, "Series input resistor inside the channel."),
                    p("firstBaseEmitterOhms", "Q1 base–emitter resistor", "Ω", 7200, 1, 1e7, "Resistor across the first transistor's base–emitter."),
                    p("secondBaseEmitterOhms", "Q2 base–emitter resistor", "Ω", 3000, 1, 1e7, "Resistor across the output transistor's base–emitter."),
                    p("saturationCurrentAmps", "IS", "A", 3e-14, 1e-18, 1e-6, "Saturation current of each transistor (model)."),
                    p("betaForward", "βF (each)", "", 100, 1, 10_000, "Forward current gain of each transistor (model)."),
                    p("hfeMin", "Channel hFE min", "", 1000, 1, 1e6, "Datasheet minimum gain of the channel."),
                    p("collectorResistanceOhms", "Output resistance", "Ω", 1.3, 0, 100, "Collector series resistance of the output transistor."),
                    p("vceoVolts", "VCE max", "V", 50, 1, 1000, "Output sustaining voltage rating."),
                    p("icMaxAmps", "Output current max", "A", 0.5, 1e-3, 10, "Rated output current per channel."),
                    p("channelCount", "Channels on", "", 1, 1, 8, "Channels of the same package on at once (thermal check)."),
                    p("thermalResistanceKelvinPerWatt", "Package RθJA", "K/W", 67, 0.1, 1000, "Package junction-to-ambient thermal resistance."),
                    p("tjMaxCelsius", "Tj max", "°C", 150, 50, 250, "Maximum junction temperature.")),
            List.of()),

    /** A relay: coil between A1 and A2, and one changeover contact set linked to it. */
    RELAY("K", "Relay", "Small PCB power relay, sealed, one changeover contact (typical values).",
            List.of(pin("a1", 0, -2, "coil A1"), pin("a2", 0, 2, "coil A2"),
                    pin("com", 5, -2, "contact common"), pin("nc", 4, 2, "normally closed"),
                    pin("no", 6, 2, "normally open")),
            List.of(
                    p("ratedVolts", "Rated coil voltage", "V", 12, 0.5, 500, "Nominal coil voltage."),
                    p("coilResistanceOhms", "Coil resistance", "Ω", 400, 0.1, 1e6, "Coil resistance at the reference temperature."),
                    p("coilResistanceTolerancePercent", "Coil resistance tolerance", "%", 10, 0, 50, "± spread of coil resistance (typical ±10 %)."),
                    p("mustOperateVolts", "Must-operate voltage", "V", 9.0, 0.01, 500,
                            "Highest coil voltage at which every sample operates, at the reference temperature (typical ≤ 75 % of rated)."),
                    p("mustReleaseVolts", "Must-release voltage", "V", 1.2, 0.001, 500,
                            "Lowest coil voltage at which every sample releases, at the reference temperature (typical ≥ 10 % of rated)."),
                    p("referenceTemperatureCelsius", "Reference temperature", "°C", 20, -60, 150,
                            "Temperature at which the datasheet coil values hold."),
                    p("coilThermalResistanceKelvinPerWatt", "Coil thermal resistance", "K/W", 100, 0, 10_000,
                            "Coil temperature rise per watt of coil power; 0 means no self-heating."),
                    p("inductanceReleasedHenries", "Inductance, released", "H", 1.2, 1e-6, 100, "Coil inductance with the armature released."),
                    p("inductanceAttractedHenries", "Inductance, attracted", "H", 0, 0, 100,
                            "Coil inductance with the armature attracted; 0 means constant inductance."),
                    p("coilCapacitanceFarads", "Coil self-capacitance", "F", 100e-12, 0, 1e-6, "Self-capacitance across the winding."),
                    p("coreLossOhms", "Core-loss resistance", "Ω", 0, 0, 1e9, "Parallel resistance for core losses; 0 means none."),
                    p("operateTimeSeconds", "Operate time", "s", 0.008, 0, 1,
                            "Datasheet operate time; sets the transit with constant inductance (no attracted inductance)."),
                    p("releaseTimeSeconds", "Release time", "s", 0.004, 0, 1,
                            "Datasheet release time without suppressor; sets the transit with constant inductance."),
                    p("travelMetres", "Armature travel", "m", 0.3e-3, 1e-6, 0.01, "Armature travel between released and attracted."),
                    p("springForceRatio", "Spring force ratio", "", 2, 1.01, 20,
                            "Spring force attracted ÷ released (typical 1.5–3, from memory)."),
                    p("armatureMassGrams", "Armature mass", "g", 1, 0.01, 100,
                            "Effective moving mass of armature and contact spring (typical about 1 g for a small PCB relay); "
                                    + "sets the flight time with an attracted inductance."),
                    p("armatureDampingNewtonSecondsPerMetre", "Armature damping", "N·s/m", 0.1, 0, 100,
                            "Viscous damping of the armature's motion (default 0.1 N·s/m: light air and pivot damping)."),
                    p("contactRatedVolts", "Contact AC rating, voltage", "V", 250, 1, 1000,
                            "Contact switching voltage rating for AC (RMS), for a resistive load (typical 250 V)."),
                    p("contactRatedAmps", "Contact AC rating, current", "A", 10, 1e-3, 100,
                            "Contact switching current rating for AC (RMS), for a resistive load (typical 10 A)."),
                    p("contactRatedDcVolts", "Contact DC rating, voltage", "V", 30, 1, 1000,
                            "Contact switching voltage rating for DC; far below the AC rating, since a DC arc has no"
                                    + " current zero (typical 30 V, CT-4)."),
                    p("contactRatedDcAmps", "Contact DC rating, current", "A", 10, 1e-3, 100,
                            "Contact switching current rating for DC at the DC rated voltage (typical 10 A)."),
                    p("contactMakeAmps", "Contact make (inrush) rating", "A", 30, 1e-3, 1000,
                            "Peak current the contacts may make at closing (typical 30 A for a 10 A relay, from memory)."),
                    p("maxCoilVoltagePercent", "Maximum allowable coil voltage", "%", 130, 100, 500,
                            "Highest continuous coil voltage as a percentage of rated, at the reference temperature"
                                    + " (datasheets: often 110–180 %; typical 130 %, CT-3)."),
                    p("insulationClassCelsius", "Coil insulation class", "°C", 130, 90, 250,
                            "Temperature limit of the coil's insulation thermal class (IEC 60085: Y 90, A 105, E 120, B 130,"
                                    + " F 155, H 180, N 200, R 220 °C; typical class B, 130 °C)."),
                    p("minArcVolts", "Minimum arc voltage", "V", 12, 0, 1000,
                            "Voltage across parting contacts below which no arc forms (typical 12 V for silver-alloy"
                                    + " contacts, from memory, CT-9)."),
                    p("minArcAmps", "Minimum arc current", "A", 0.4, 0, 100,
                            "Current below which no arc forms at the parting contacts (typical 0.4 A for silver-alloy"
                                    + " contacts, from memory, CT-9)."),
                    p("contactWithstandVolts", "Open-contact withstand", "V", 1000, 10, 10_000,
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
                    p("resistanceOhms", "Resistance", "Ω", 48, 1e-3, 1e9,
                            "Steady load resistance when on (a lamp: hot filament; an AC motor or solenoid: the"
                                    + " impedance |Z| = V/I; an LED: its series resistor)."),
                    p("ratedWatts", "Rated power", "W", 3, 0, 1e5,
                            "Rated load power at the contact-side rail, for the plausibility check (0: not given)."),
                    p("inrushMultiple", "Inrush multiple", "", 0, 0, 1000,
                            "Peak current at closing ÷ steady current; 0 takes the kind's typical value (lamp: tungsten law;"
                                    + " motor ×6; AC solenoid ×10; capacitive: from the loop resistance; common practice, CT-5)."),
                    p("inrushSeconds", "Inrush duration", "s", 0, 0, 10,
                            "Time constant of the inrush decay; 0 takes the kind's typical value (common practice)."),
                    p("powerFactor", "Power factor", "", 0, 0, 1,
                            "cos φ of an AC motor or solenoid; 0 takes the kind's typical value (motor 0.8, solenoid 0.4)."),
                    p("inductanceHenries", "Inductance", "H", 0, 0, 1000,
                            "Inductance of a DC motor or solenoid; 0 takes L/R = 2 ms per watt (time constant of the"
                                    + " IEC 60947-5-1 DC-13 test load, T0.95 ≈ 6·P ms, from memory)."),
                    p("filamentKelvin", "Filament temperature", "K", 2700, 1000, 3600,
                            "Hot filament temperature of a lamp (typical 2,700 K for a general-service lamp)."),
                    p("capacitanceFarads", "Input capacitance", "F", 0, 0, 1,
                            "Input capacitance of a capacitive load; 0 takes 2 µF per watt (typical bulk capacitor, from memory)."),
                    p("loopResistanceOhms", "Loop resistance", "Ω", 1, 1e-3, 1e4,
                            "Source plus wiring resistance that limits a capacitive inrush (typical 1 Ω)."),
                    p("forwardVolts", "LED forward voltage", "V", 2, 0, 60,
                            "Forward voltage of an LED load, in series with its resistor (typical 2 V).")),
            List.of(new OptionSpec("loadKind", "Kind", List.of("resistive", "lamp", "motor", "solenoid", "capacitive", "led"),
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

    private static ParamSpec p(String key, String label, String unit, double def, double min, double max,
                               String description) {
        return new ParamSpec(key, label, unit, def, min, max, description);
    }

    private static List<ParamSpec> junctionParams(double is, double n, double rs, double bv, double ibv,
                                                  double ifMax, double pMax) {
        return List.of(
                p("saturationCurrentAmps", "IS", "A", is, 1e-20, 1e-3, "Shockley saturation current (model)."),
                p("emissionCoefficient", "N", "", n, 0.5, 10, "Emission coefficient (model)."),
                p("seriesResistanceOhms", "Series resistance", "Ω", rs, 0, 1e4, "Ohmic series resistance (model)."),
                p("breakdownVolts", "Reverse breakdown", "V", bv, 0.5, 5000,
                        "Reverse breakdown voltage (a zener's VZ; a rectifier's reverse rating)."),
                p("breakdownCurrentAmps", "Breakdown test current", "A", ibv, 1e-12, 10,
                        "Reverse current at which the breakdown voltage is stated."),
                p("maxCurrentAmps", "Peak current rating", "A", ifMax, 1e-4, 1000, "Repetitive peak current rating."),
                p("powerRatingWatts", "Power rating", "W", pMax, 1e-3, 1000, "Rated dissipation."));
    }

    private static List<ParamSpec> bjtParams() {
        return List.of(
                p("saturationCurrentAmps", "IS", "A", 1e-14, 1e-20, 1e-6, "Transport saturation current (model)."),
                p("betaForward", "βF", "", 200, 1, 10_000, "Ideal forward gain of the model (typical hFE)."),
                p("betaReverse", "βR", "", 2, 0.01, 1000, "Reverse gain (model)."),
                p("earlyVolts", "VAF", "V", 100, 1, 10_000, "Forward Early voltage (model)."),
                p("kneeCurrentAmps", "IKF", "A", 0.3, 1e-4, 100, "High-injection knee current (model): gain falls above it."),
                p("baseResistanceOhms", "RB", "Ω", 10, 0, 1e4, "Base spreading resistance (model)."),
                p("collectorResistanceOhms", "RC", "Ω", 1, 0, 1e3, "Collector series resistance (model)."),
                p("emitterResistanceOhms", "RE", "Ω", 0.2, 0, 1e3, "Emitter series resistance (model)."),
                p("gainTempExponent", "XTB", "", 1.5, 0, 10, "Gain temperature exponent: βF·(T/Tnom)^XTB (from memory)."),
                p("hfeMin", "hFE min", "", 100, 1, 1e5, "Datasheet minimum DC gain at the relevant collector current."),
                p("vbeSatVolts", "VBE(sat) max", "V", 0.95, 0.3, 3, "Datasheet maximum VBE(sat) at IC/IB = 10."),
                p("vceSatVolts", "VCE(sat) max", "V", 0.3, 0.01, 5, "Datasheet maximum VCE(sat) at IC/IB = 10."),
                p("vceoVolts", "VCEO", "V", 40, 1, 2000, "Collector–emitter breakdown rating (base open)."),
                p("icMaxAmps", "IC max", "A", 0.6, 1e-4, 100, "Continuous collector current rating."),
                p("thermalResistanceKelvinPerWatt", "RθJA", "K/W", 200, 0.1, 2000,
                        "Junction-to-ambient thermal resistance (TO-92 typical 200 °C/W)."),
                p("tjMaxCelsius", "Tj max", "°C", 150, 50, 250, "Maximum junction temperature."));
    }
}
