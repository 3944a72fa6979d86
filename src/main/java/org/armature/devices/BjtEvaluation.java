package org.armature.devices;

/**
 * Caller-owned result holder of {@link Bjt#evaluate}: terminal currents and their partial
 * derivatives with respect to the intrinsic junction voltages VBE and VBC (as given, that is in
 * the device's own polarity). Currents flow into the terminal; the emitter current is
 * −(IC + IB). Every call overwrites all six values.
 */
public final class BjtEvaluation {

    private double collectorAmps;
    private double baseAmps;
    private double dCollectorDvbe;
    private double dCollectorDvbc;
    private double dBaseDvbe;
    private double dBaseDvbc;

    /** Creates a holder with all values zero. */
    public BjtEvaluation() {
        // fields start at zero
    }

    void set(double ic, double ib, double dicDvbe, double dicDvbc, double dibDvbe, double dibDvbc) {
        this.collectorAmps = ic;
        this.baseAmps = ib;
        this.dCollectorDvbe = dicDvbe;
        this.dCollectorDvbc = dicDvbc;
        this.dBaseDvbe = dibDvbe;
        this.dBaseDvbc = dibDvbc;
    }

    /** @return IC, current into the collector, amperes */
    public double collectorAmps() {
        return collectorAmps;
    }

    /** @return IB, current into the base, amperes */
    public double baseAmps() {
        return baseAmps;
    }

    /** @return IE, current into the emitter, −(IC + IB), amperes */
    public double emitterAmps() {
        return -(collectorAmps + baseAmps);
    }

    /** @return ∂IC/∂VBE, siemens */
    public double dCollectorDvbe() {
        return dCollectorDvbe;
    }

    /** @return ∂IC/∂VBC, siemens */
    public double dCollectorDvbc() {
        return dCollectorDvbc;
    }

    /** @return ∂IB/∂VBE, siemens */
    public double dBaseDvbe() {
        return dBaseDvbe;
    }

    /** @return ∂IB/∂VBC, siemens */
    public double dBaseDvbc() {
        return dBaseDvbc;
    }
}
