package org.armature.netlist;

import java.util.List;
import org.armature.devices.CoilResistance;
import org.armature.units.PhysicalConstants;

/**
 * The DC model of a relay coil: its copper resistance at the coil temperature held in a state
 * slot, from the devices package's {@link CoilResistance#copper} law,
 * R(T) = R_ref·(234.5 + T)/(234.5 + T_ref) with temperatures in °C (copper's zero-resistance
 * intercept −234.5 °C, IEC 60028). The inductance is a short at DC.
 */
public final class RelayCoil implements Element {

    private final String label;
    private final int a1;
    private final int a2;
    private final CoilResistance copper;
    private final int temperatureSlot;

    /**
     * @param label designator for messages
     * @param a1 node of coil end A1
     * @param a2 node of coil end A2
     * @param referenceOhms coil resistance at the reference temperature, Ω, positive
     * @param referenceCelsius reference temperature, °C
     * @param temperatureSlot state slot holding the coil temperature, °C
     */
    public RelayCoil(String label, int a1, int a2, double referenceOhms, double referenceCelsius,
                     int temperatureSlot) {
        if (!(referenceOhms > 0) || !Double.isFinite(referenceOhms)) {
            throw new IllegalArgumentException("coil resistance of " + label + " must be positive");
        }
        this.label = label;
        this.a1 = a1;
        this.a2 = a2;
        this.copper = CoilResistance.copper(referenceOhms, PhysicalConstants.celsiusToKelvin(referenceCelsius));
        this.temperatureSlot = temperatureSlot;
    }

    /**
     * @param coilCelsius coil temperature, °C, above −234.5 °C
     * @return coil resistance at that temperature, Ω
     */
    public double ohmsAt(double coilCelsius) {
        return copper.resistanceOhms(PhysicalConstants.celsiusToKelvin(coilCelsius));
    }

    /** @return the state slot of the coil temperature (°C) */
    public int temperatureSlot() {
        return temperatureSlot;
    }

    /**
     * @param x a solution
     * @return coil current from A1 to A2, A
     */
    public double current(Solution x) {
        return (x.voltage(a1) - x.voltage(a2)) / ohmsAt(x.state(temperatureSlot));
    }

    @Override
    public String label() {
        return label;
    }

    @Override
    public int[] terminals() {
        return new int[] {a1, a2};
    }

    @Override
    public List<int[]> conductingPairs() {
        return List.of(new int[] {a1, a2});
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        s.conductance(a1, a2, 1.0 / ohmsAt(x.state(temperatureSlot)));
        return false;
    }
}
