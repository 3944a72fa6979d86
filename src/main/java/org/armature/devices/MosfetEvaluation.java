package org.armature.devices;

/**
 * Caller-owned result holder of {@link Mosfet#evaluate}: drain current and its partial
 * derivatives with respect to the terminal voltages VGS and VDS as given (after any
 * source/drain interchange has been undone). Every call overwrites all three values.
 */
public final class MosfetEvaluation {

    private double drainAmps;
    private double gmSiemens;
    private double gdsSiemens;

    /** Creates a holder with all values zero. */
    public MosfetEvaluation() {
        // fields start at zero
    }

    void set(double id, double gm, double gds) {
        this.drainAmps = id;
        this.gmSiemens = gm;
        this.gdsSiemens = gds;
    }

    /** @return ID, current into the drain, amperes (negative when VDS &lt; 0) */
    public double drainAmps() {
        return drainAmps;
    }

    /** @return ∂ID/∂VGS, siemens */
    public double gmSiemens() {
        return gmSiemens;
    }

    /** @return ∂ID/∂VDS, siemens */
    public double gdsSiemens() {
        return gdsSiemens;
    }
}
