package org.armature.netlist;

import org.armature.devices.RelayThresholds;

/**
 * What the DC engine needs to know about one relay of a netlist: its coil element, the state slots
 * of coil temperature (°C) and contact state (1 operated, 0 released), the thermal resistance for
 * self-heating, and the pick-up and drop-out currents.
 *
 * <p>Pick-up and drop-out are currents, not voltages: the armature responds to ampere-turns, so the
 * datasheet's must-operate and must-release voltages at the reference temperature are divided by
 * the coil resistance at that temperature, and a hot coil needs a higher voltage for the same
 * current (relay makers' temperature notes; check-values.md RC-7).
 *
 * @param ref relay designator
 * @param coil the coil element
 * @param temperatureSlot state slot of the coil temperature, °C
 * @param contactSlot state slot of the contact state, 1 operated / 0 released
 * @param thermalResistanceKelvinPerWatt coil temperature rise per watt of coil power, K/W, ≥ 0
 * @param thresholds pick-up and drop-out currents ({@link RelayThresholds} of the devices package)
 */
public record RelayHandle(String ref, RelayCoil coil, int temperatureSlot, int contactSlot,
                          double thermalResistanceKelvinPerWatt, RelayThresholds thresholds) {

    /** @return coil current at which every sample operates, A */
    public double pickUpAmps() {
        return thresholds.pickUpAmps();
    }

    /** @return coil current at which every sample releases, A */
    public double dropOutAmps() {
        return thresholds.dropOutAmps();
    }

    /** The relay's armature state implied by a coil current. */
    public enum State {
        /** At or above pick-up: every sample has operated. */
        OPERATED("operated"),
        /** At or below drop-out: every sample has released. */
        RELEASED("released"),
        /** Between drop-out and pick-up: the state depends on history. */
        EITHER("either");

        private final String key;

        State(String key) {
            this.key = key;
        }

        /** @return the result key ({@code operated}, {@code released}, {@code either}) */
        public String key() {
            return key;
        }
    }

    /**
     * @param coilAmps coil current, A (either direction: the coil is not polarised)
     * @return the state that current implies
     */
    public State stateFor(double coilAmps) {
        return switch (thresholds.classify(coilAmps)) {
            case OPERATED -> State.OPERATED;
            case RELEASED -> State.RELEASED;
            case EITHER -> State.EITHER;
        };
    }
}
