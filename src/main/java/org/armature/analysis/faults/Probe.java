package org.armature.analysis.faults;

import org.armature.model.PinRef;

/**
 * A point the technician can probe: a named net against ground, or the relay coil (its on-state
 * high end against its low end, whose voltage is the coil current times its resistance).
 *
 * @param name the net's name as {@code solve} prints it, or {@value #COIL} for the coil
 * @param plus a pin on the net under the red lead
 * @param minus a pin on the net under the black lead (a ground pin for a net)
 */
public record Probe(String name, PinRef plus, PinRef minus) {

    /** The name of the probe across the relay coil. */
    public static final String COIL = "coil";
}
