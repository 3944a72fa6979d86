package org.armature.solver.timedomain;

/**
 * The armature of a relay with constant inductance (no attracted inductance given; with one the
 * run uses {@link ArmatureDynamics}): it starts to move when the coil current reaches
 * pick-up (from released) or falls to drop-out (from attracted), as located events, and takes a
 * transit time to the other end, where the contacts change. The transit times come from the
 * datasheet: operate transit = operate time minus the L/R rise to pick-up at rated voltage; release
 * transit = release time (stated without suppressor, when the current collapses in microseconds).
 * The position trace ramps linearly during a transit (a stand-in for the motion, which this model
 * does not resolve).
 */
final class RelayDynamics {

    enum Phase { RELEASED, OPERATING, OPERATED, RELEASING }

    final String ref;
    final TransientCoil coil;
    final int contactSlot;
    final double pickUpAmps;
    final double dropOutAmps;
    final double operateTransitSeconds;
    final double releaseTransitSeconds;
    final double travelMetres;
    Phase phase;
    double moveStart;
    double positionAtStart;

    RelayDynamics(String ref, TransientCoil coil, int contactSlot, double pickUpAmps, double dropOutAmps,
                  double operateTransitSeconds, double releaseTransitSeconds, double travelMetres, boolean operated) {
        this.ref = ref;
        this.coil = coil;
        this.contactSlot = contactSlot;
        this.pickUpAmps = pickUpAmps;
        this.dropOutAmps = dropOutAmps;
        this.operateTransitSeconds = operateTransitSeconds;
        this.releaseTransitSeconds = releaseTransitSeconds;
        this.travelMetres = travelMetres;
        this.phase = operated ? Phase.OPERATED : Phase.RELEASED;
    }

    boolean headingAttracted() {
        return phase == Phase.OPERATING || phase == Phase.OPERATED;
    }

    /** Event function: negative before the threshold that would reverse the armature's course. */
    double eventFunction(double coilAmps) {
        return headingAttracted() ? dropOutAmps - Math.abs(coilAmps) : Math.abs(coilAmps) - pickUpAmps;
    }

    /** Travel from the released stop, metres. */
    double position(double t) {
        return switch (phase) {
            case RELEASED -> 0;
            case OPERATED -> travelMetres;
            case OPERATING -> Math.min(travelMetres, positionAtStart
                    + travelMetres * (t - moveStart) / Math.max(operateTransitSeconds, Double.MIN_NORMAL));
            case RELEASING -> Math.max(0, positionAtStart
                    - travelMetres * (t - moveStart) / Math.max(releaseTransitSeconds, Double.MIN_NORMAL));
        };
    }

    /**
     * The threshold was crossed at t: start moving the other way.
     *
     * @return the time at which the contacts change (end of transit)
     */
    double reverse(double t) {
        double pos = position(t);
        moveStart = t;
        positionAtStart = pos;
        if (headingAttracted()) {
            phase = Phase.RELEASING;
            return t + releaseTransitSeconds * pos / travelMetres;
        }
        phase = Phase.OPERATING;
        return t + operateTransitSeconds * (travelMetres - pos) / travelMetres;
    }

    /** The transit ends at t: the armature is at its stop. @return true if now attracted */
    boolean arrive() {
        phase = phase == Phase.OPERATING ? Phase.OPERATED : Phase.RELEASED;
        return phase == Phase.OPERATED;
    }
}
