package org.armature.solver;

import org.armature.model.ParamKeys;

/** What a DC sweep varies. */
public sealed interface SweepVariable permits SweepVariable.PartParameter, SweepVariable.Ambient {

    /**
     * A part parameter by designator and key (SI units as the key says).
     *
     * @param ref designator
     * @param key parameter key of the part's kind
     */
    record PartParameter(String ref, String key) implements SweepVariable {
    }

    /** The ambient temperature, °C. */
    record Ambient() implements SweepVariable {
    }

    /**
     * @param ref supply designator
     * @return the supply's voltage
     */
    static SweepVariable supplyVolts(String ref) {
        return new PartParameter(ref, ParamKeys.VOLTS);
    }

    /**
     * @param ref drive pin designator
     * @param high true for the high level, false for the low level
     * @return the pin's open-circuit level
     */
    static SweepVariable pinLevel(String ref, boolean high) {
        return new PartParameter(ref, high ? ParamKeys.HIGH_VOLTS : ParamKeys.LOW_VOLTS);
    }

    /** @return the ambient temperature */
    static SweepVariable ambient() {
        return new Ambient();
    }
}
