package org.armature.solver.timedomain;

import org.armature.devices.BreakdownClamp;
import org.armature.devices.Diode;
import org.armature.devices.DiodeParams;
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
}
