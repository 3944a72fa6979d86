package org.armature.solver;

import java.util.List;

/**
 * The circuit has no unique DC solution: a node with no DC path to ground (a MOSFET gate or a
 * capacitor pin connected to nothing else, a sub-circuit joined to the rest only through
 * capacitors), a loop of voltage sources (two supplies on one net, a supply shorted to ground), or
 * a matrix singular to working precision. The message names the nodes and parts.
 */
public final class SingularCircuitException extends SolverException {

    private static final long serialVersionUID = 1L;

    /** What made the circuit singular. */
    public enum Cause {
        /** Nodes with no DC path to ground. Key {@code solver.floating-node}. */
        FLOATING_NODE("solver.floating-node"),
        /** Voltage sources in a loop. Key {@code solver.source-loop}. */
        VOLTAGE_SOURCE_LOOP("solver.source-loop"),
        /** A pivot below the relative threshold. Key {@code solver.singular-matrix}. */
        SINGULAR_MATRIX("solver.singular-matrix");

        private final String key;

        Cause(String key) {
            this.key = key;
        }

        /** @return the message key */
        public String key() {
            return key;
        }
    }

    private final Cause cause;
    private final List<String> nodes;
    private final List<String> parts;

    /**
     * @param cause what made it singular
     * @param nodes the nodes concerned (net names or internal node names)
     * @param parts the parts concerned (designators or element labels)
     * @param message sentence naming them
     */
    public SingularCircuitException(Cause cause, List<String> nodes, List<String> parts, String message) {
        super(cause.key(), message);
        this.cause = cause;
        this.nodes = List.copyOf(nodes);
        this.parts = List.copyOf(parts);
    }

    /** @return what made the circuit singular */
    public Cause singularCause() {
        return cause;
    }

    /** @return the nodes concerned */
    public List<String> nodes() {
        return nodes;
    }

    /** @return the parts concerned */
    public List<String> parts() {
        return parts;
    }
}
