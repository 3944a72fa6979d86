package org.armature.solver.timedomain;

import org.armature.devices.BreakdownClamp;
import org.armature.devices.Diode;
import org.armature.devices.DiodeParams;
import org.armature.devices.MovingArmature;
import org.armature.netlist.NortonSource;
import org.armature.netlist.Resistor;
import org.armature.netlist.VoltageSource;

/**
 * Hand-built low-side stages for the closed-form tests: a 12 V rail, the coil (R, L) from the rail
 * (node 0, A1) to the switch node (node 1, A2), a switch that is 1 mΩ when the drive is high and
 * 1 GΩ when low, and the suppressor under test across the coil.
 */
final class Circuits {

    static final int GND = -1;
    static final int SUPPLY = 0;
    static final int SWITCH = 1;
    static final double VOLTS = 12;

    private Circuits() {
    }

    enum Clamp { NONE, CONSTANT, RESISTOR, DIODE }

    /**
     * A low-side coil with a moving armature: a rail of {@code volts}, the coil (R of the model,
     * L(g)), a switch of {@code onOhms} when the drive is high and {@code offOhms} when low, and a
     * plain diode ({@code diode}) or an ideal constant clamp of {@code clampVolts} (when positive)
     * switched in with the turn-off. State slot 0 holds the contact state.
     */
    static TimeDomainCircuit armature(double volts, MovingArmature m, double onOhms, double offOhms, boolean diode,
                                      double clampVolts, boolean attracted) {
        double ohms = m.coilResistanceOhms();
        TimeDomainCircuit c = new TimeDomainCircuit(diode ? 3 : 2, 1, new double[] {attracted ? 1 : 0});
        c.add(new VoltageSource("V1", SUPPLY, GND, 0, volts));
        TransientCoil coil = c.add(new TransientCoil("K1", SUPPLY, SWITCH, ohms, m.inductanceHenries(0),
                m.inductanceHenries(0), c.step));
        c.armatures.add(new ArmatureDynamics("K1", coil, 0, m, attracted));
        c.driveHigh.add(new Resistor("Q1 on", SWITCH, GND, onOhms));
        c.driveLow.add(new Resistor("Q1 off", SWITCH, GND, offOhms));
        c.coilCurrent = new Probe("coil", "A", coil::current);
        c.coilVoltage = new Probe("coil v", "V", x -> x.voltage(SUPPLY) - x.voltage(SWITCH));
        c.switchVoltage = new Probe("switch v", "V", x -> x.voltage(SWITCH));
        c.coilLossPower = new Probe("coil loss", "W", x -> {
            double i = coil.current(x);
            return ohms * i * i;
        });
        c.dropOutAmps = m.dropOutAmps();
        c.storedEnergyHenries = m.inductanceHenries(attracted ? 0 : m.travelMetres());
        if (diode) {
            Diode d = new Diode(DiodeParams.junction(1e-9, 1.8));
            c.add(new org.armature.netlist.JunctionElement("D1", SWITCH, 2, d, 298.15, 1e-12));
            c.add(new Resistor("D1 RS", 2, SUPPLY, 0.05));
        } else if (clampVolts > 0) {
            c.driveLow.add(new NortonSource("clamp", SWITCH, SUPPLY, clampVolts, 1e-3));
        }
        return c;
    }

    /**
     * @param clampValue clamp volts (CONSTANT), ohms (RESISTOR), or ignored
     * @param capFarads coil self-capacitance, 0 for none
     * @param ratedVolts switch rating for the breakdown clamp, 0 for none
     */
    static TimeDomainCircuit lowSide(double ohms, double henries, Clamp clamp, double clampValue, double capFarads,
                                     double ratedVolts) {
        int nodes = clamp == Clamp.DIODE ? 3 : 2;
        TimeDomainCircuit c = new TimeDomainCircuit(nodes, 1, new double[0]);
        c.add(new VoltageSource("V1", SUPPLY, GND, 0, VOLTS));
        TransientCoil coil = c.add(new TransientCoil("K1", SUPPLY, SWITCH, ohms, henries, henries, c.step));
        Resistor on = new Resistor("Q1 on", SWITCH, GND, 1e-3);
        Resistor off = new Resistor("Q1 off", SWITCH, GND, 1e9);
        c.driveHigh.add(on);
        c.driveLow.add(off);
        c.node("supply", SUPPLY);
        c.node("switch", SWITCH);
        c.coilCurrent = new Probe("coil", "A", coil::current);
        c.coilVoltage = new Probe("coil v", "V", x -> x.voltage(SUPPLY) - x.voltage(SWITCH));
        c.switchVoltage = new Probe("switch v", "V", x -> x.voltage(SWITCH));
        c.coilLossPower = new Probe("coil loss", "W", x -> {
            double i = coil.current(x);
            return ohms * i * i;
        });
        c.dropOutAmps = 0.1 * VOLTS / ohms;
        c.storedEnergyHenries = henries;
        if (capFarads > 0) {
            c.add(new TransientCapacitor("K1 self-capacitance", SUPPLY, SWITCH, capFarads, c.step));
        }
        SwitchClamp sc = null;
        if (ratedVolts > 0) {
            sc = c.add(new SwitchClamp("Q1 breakdown", SWITCH, GND, BreakdownClamp.atRating(ratedVolts)));
        }
        SwitchClamp scFinal = sc;
        c.switchPower = new Probe("switch p", "W", x -> {
            double v = x.voltage(SWITCH);
            double i = (scFinal == null ? 0 : scFinal.current(x));
            return v * i;
        });
        switch (clamp) {
            case NONE -> { }
            case CONSTANT -> {
                // an ideal clamp of clampValue volts, switched in with the turn-off: A2 above A1 by Vc
                NortonSource src = new NortonSource("clamp", SWITCH, SUPPLY, clampValue, 1e-3);
                c.driveLow.add(src);
                c.suppressorPower = new Probe("supp p", "W", x -> {
                    double v = x.voltage(SWITCH) - x.voltage(SUPPLY);
                    return v * (v - clampValue) / 1e-3;
                });
            }
            case RESISTOR -> {
                Resistor r = c.add(new Resistor("R5", SUPPLY, SWITCH, clampValue));
                c.suppressorPower = new Probe("supp p", "W", x -> {
                    double v = x.voltage(SUPPLY) - x.voltage(SWITCH);
                    return v * v / clampValue;
                });
                c.suppressorCurrent = new Probe("supp i", "A", r::current);
            }
            case DIODE -> {
                // general-purpose silicon rectifier (PartKind.DIODE defaults: IS 1 nA, N 1.8, RS 0.05 Ω)
                Diode d = new Diode(DiodeParams.junction(1e-9, 1.8));
                org.armature.netlist.JunctionElement j = c.add(new org.armature.netlist.JunctionElement("D1",
                        SWITCH, 2, d, 298.15, 1e-12));
                Resistor rs = c.add(new Resistor("D1 RS", 2, SUPPLY, 0.05));
                c.suppressorPower = new Probe("supp p", "W", x -> (x.voltage(SWITCH) - x.voltage(SUPPLY)) * j.current(x));
                c.suppressorCurrent = new Probe("supp i", "A", j::current);
                c.probes.add(new Probe("I(D1)", "A", rs::current));
            }
            default -> throw new IllegalStateException();
        }
        return c;
    }

    /**
     * Work done by the magnetic pull on the armature from {@code fromSeconds} to the end of a run,
     * joules: ∫ F·d(position) by the trapezoidal rule over the samples (position = T − g; the pull
     * closes the gap, so an opening armature gives negative work). Energy balance of the coupling
     * (derived): ∫ i·dλ = ΔW_field + this work.
     */
    static double pullWorkJoules(Waveform w, MovingArmature m, double fromSeconds) {
        Trace i = w.require(Waveform.COIL_CURRENT);
        Trace pos = w.require(Waveform.ARMATURE_POSITION);
        double t = m.travelMetres();
        double work = 0;
        for (int k = 1; k < w.size(); k++) {
            if (w.time(k - 1) >= fromSeconds) {
                double f0 = m.magneticForceNewtons(i.value(k - 1), t - pos.value(k - 1));
                double f1 = m.magneticForceNewtons(i.value(k), t - pos.value(k));
                work += 0.5 * (f0 + f1) * (pos.value(k) - pos.value(k - 1));
            }
        }
        return work;
    }

    /** Magnetic energy ½·L(g)·i² at the last sample of a run, joules. */
    static double endFieldEnergyJoules(Waveform w, MovingArmature m) {
        int last = w.size() - 1;
        double i = w.require(Waveform.COIL_CURRENT).value(last);
        double g = m.travelMetres() - w.require(Waveform.ARMATURE_POSITION).value(last);
        return 0.5 * m.inductanceHenries(g) * i * i;
    }
}
