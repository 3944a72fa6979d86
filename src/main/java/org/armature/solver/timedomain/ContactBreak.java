package org.armature.solver.timedomain;

import org.armature.devices.BreakdownClamp;
import org.armature.devices.Diode;
import org.armature.devices.DiodeParams;
import org.armature.netlist.JunctionElement;
import org.armature.netlist.Resistor;
import org.armature.netlist.VoltageSource;

/**
 * The break of an inductive DC load by a relay's contacts, run by the transient engine: a rail,
 * the contacts (closed: {@value #CLOSED_OHMS} Ω; open: {@value #OPEN_OHMS} Ω), and the load as a
 * series R–L to ground, with the stray capacitance of contacts and wiring across the contacts and
 * the chosen contact protection. The contacts part at {@value #EDGE_SECONDS} s as an ideal switch;
 * what the gap then has to hold off is the voltage across it, and whether an arc forms is judged
 * from that voltage and the current against the contact material's minimum arc voltage and
 * current (done by the caller, which knows the relay).
 *
 * <p>Circuit theory for the tests (derived, check-values.md CT-10): with an RC of R_s and C across the
 * contacts the loop after parting is a series R–L–C driven by the rail, i(0) = I0, v_C(0) = 0, so
 * for small R the peak contact voltage approaches V + I0·√(L/C); with nothing across the contacts
 * the stray capacitance alone rings to V + I0·√(L/C_stray), kilovolts for a solenoid, where in
 * practice the gap breaks down and arcs.
 */
public final class ContactBreak {

    /** Resistance of closed contacts, ohms (typical contact resistance ≤ 100 mΩ; 1 mΩ keeps the model ideal). */
    public static final double CLOSED_OHMS = 1e-3;
    /** Resistance of open contacts, ohms (insulation of an open gap, typical ≥ 1 GΩ). */
    public static final double OPEN_OHMS = 1e9;
    /** Time at which the contacts part, seconds. */
    public static final double EDGE_SECONDS = 1e-6;
    /** Stray capacitance across the contacts and wiring, farads (typical 100 pF, from memory). */
    public static final double STRAY_FARADS = 100e-12;

    private static final int GND = -1;
    private static final int RAIL = 0;
    private static final int LOAD = 1;
    private static final int SNUB = 2;

    private ContactBreak() {
    }

    /** What protects the contacts. */
    public enum Protection {
        /** Nothing: only the stray capacitance across the contacts. */
        NONE("no contact protection"),
        /** A series R–C across the contacts. */
        RC("RC across the contacts"),
        /** A varistor across the contacts, modelled as a sharp clamp at its clamping voltage. */
        VARISTOR("varistor across the contacts"),
        /** A freewheeling diode across a DC load. */
        DIODE("diode across the load");

        private final String words;

        Protection(String words) {
            this.words = words;
        }

        /** The protection in a few words. */
        public String words() {
            return words;
        }
    }

    /**
     * One break to run.
     *
     * @param railVolts DC rail, volts, positive
     * @param loadOhms series resistance of the load, ohms, positive
     * @param loadHenries series inductance of the load, henries, positive
     * @param strayFarads capacitance across the contacts, farads, positive
     * @param protection what protects the contacts
     * @param snubberOhms the RC's resistance, ohms (RC only)
     * @param snubberFarads the RC's capacitance, farads (RC only)
     * @param clampVolts the varistor's clamping voltage, volts (varistor only)
     */
    public record Setup(double railVolts, double loadOhms, double loadHenries, double strayFarads,
                        Protection protection, double snubberOhms, double snubberFarads, double clampVolts) {

        public Setup {
            if (!(railVolts > 0) || !(loadOhms > 0) || !(loadHenries > 0) || !(strayFarads > 0)) {
                throw new IllegalArgumentException("railVolts, loadOhms, loadHenries and strayFarads must be positive");
            }
            if (protection == null) {
                throw new IllegalArgumentException("protection must not be null");
            }
            if (protection == Protection.RC && !(snubberOhms > 0 && snubberFarads > 0)) {
                throw new IllegalArgumentException("an RC across the contacts needs positive snubberOhms and snubberFarads");
            }
            if (protection == Protection.VARISTOR && !(clampVolts > railVolts)) {
                throw new IllegalArgumentException("a varistor must clamp above the rail, clampVolts > railVolts");
            }
        }

        /** The same break with another protection. */
        public Setup with(Protection p, double ohms, double farads, double volts) {
            return new Setup(railVolts, loadOhms, loadHenries, strayFarads, p, ohms, farads, volts);
        }
    }

    /**
     * What the contacts saw.
     *
     * @param peakContactVolts largest voltage across the opening contacts, volts
     * @param peakSeconds when it came, after the contacts parted, seconds
     * @param initialAmps load current when the contacts parted, amperes
     * @param storedJoules ½·L·I0², the energy the protection (or an arc) must take, joules
     * @param protectionJoules energy taken by the protection device during the run, joules
     * @param waveform the run: {@code V(contacts)} and {@code I(load)}
     */
    public record Result(double peakContactVolts, double peakSeconds, double initialAmps, double storedJoules,
                         double protectionJoules, Waveform waveform) {
    }

    /**
     * Runs the break.
     *
     * @throws TransientFailureException if the engine cannot complete the run
     */
    public static Result run(Setup s) {
        boolean rc = s.protection() == Protection.RC;
        TimeDomainCircuit c = new TimeDomainCircuit(rc ? 3 : 2, 1, new double[0]);
        c.add(new VoltageSource("contact rail", RAIL, GND, 0, s.railVolts()));
        TransientCoil load = c.add(new TransientCoil("load", LOAD, GND, s.loadOhms(), s.loadHenries(),
                s.loadHenries(), c.step));
        c.add(new TransientCapacitor("contact stray capacitance", RAIL, LOAD, s.strayFarads(), c.step));
        c.driveHigh.add(new Resistor("contacts closed", RAIL, LOAD, CLOSED_OHMS));
        c.driveLow.add(new Resistor("contacts open", RAIL, LOAD, OPEN_OHMS));
        Probe protectionPower;
        double tau;
        switch (s.protection()) {
            case RC -> {
                Resistor r = c.add(new Resistor("snubber R", RAIL, SNUB, s.snubberOhms()));
                c.add(new TransientCapacitor("snubber C", SNUB, LOAD, s.snubberFarads(), c.step));
                protectionPower = new Probe("P(protection)", "W", x -> {
                    double i = r.current(x);
                    return i * i * s.snubberOhms();
                });
                tau = ringSeconds(s.loadHenries(), s.snubberFarads() + s.strayFarads());
            }
            case VARISTOR -> {
                SwitchClamp v = c.add(new SwitchClamp("varistor", RAIL, LOAD, BreakdownClamp.atRating(s.clampVolts())));
                protectionPower = new Probe("P(protection)", "W", x -> v.current(x) * (x.voltage(RAIL) - x.voltage(LOAD)));
                // time for the load current to reach zero through the clamp, τ·ln(1 + I0·R/(Vc − V)), I0·R = V (check-values.md, suppression)
                tau = s.loadHenries() / s.loadOhms() * Math.log(1 + s.railVolts() / (s.clampVolts() - s.railVolts()))
                        + ringSeconds(s.loadHenries(), s.strayFarads());
            }
            case DIODE -> {
                // general-purpose silicon rectifier (PartKind.DIODE defaults: IS 1 nA, N 1.8)
                JunctionElement d = c.add(new JunctionElement("load diode", GND, LOAD, new Diode(
                        DiodeParams.junction(1e-9, 1.8)), 298.15, 1e-12));
                protectionPower = new Probe("P(protection)", "W", x -> d.current(x) * (0 - x.voltage(LOAD)));
                tau = 3 * s.loadHenries() / s.loadOhms();
            }
            default -> {
                protectionPower = new Probe("P(protection)", "W", x -> 0);
                tau = ringSeconds(s.loadHenries(), s.strayFarads());
            }
        }
        c.node("rail", RAIL);
        c.node("load", LOAD);
        c.probes.add(new Probe("V(contacts)", "V", x -> x.voltage(RAIL) - x.voltage(LOAD)));
        c.probes.add(new Probe("I(load)", "A", load::current));
        c.probes.add(protectionPower);
        double duration = EDGE_SECONDS + 2 * tau;
        TimeDomainResult r = new TimeDomainRun(c, new DriveWaveform.TurnOff(EDGE_SECONDS), duration,
                StepOptions.DEFAULTS).run();
        Waveform w = r.waveform();
        double[] v = w.require("V(contacts)").values();
        double[] i = w.require("I(load)").values();
        double[] p = w.require("P(protection)").values();
        int at = 0;
        for (int k = 1; k < v.length; k++) {
            if (v[k] > v[at]) {
                at = k;
            }
        }
        double energy = 0;
        for (int k = 1; k < p.length; k++) {
            energy += 0.5 * (p[k] + p[k - 1]) * (w.time(k) - w.time(k - 1));
        }
        double i0 = i[0];
        return new Result(v[at], w.time(at) - EDGE_SECONDS, i0, 0.5 * s.loadHenries() * i0 * i0, energy, w);
    }

    /** Half a period of the L–C ring, seconds: long enough to pass its first peak. */
    private static double ringSeconds(double henries, double farads) {
        return Math.PI * Math.sqrt(henries * farads);
    }
}
