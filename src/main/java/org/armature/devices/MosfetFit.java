package org.armature.devices;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Result of fitting the level-1 MOSFET to datasheet figures, with
 * {@link #fit(MosfetParams, double, double, double, double, double)}: β from RDS(on) at a stated
 * VGS and drain current, VT0 from VGS(th) at a stated drain current (measured with VDS = VGS,
 * so in saturation).
 *
 * @param params the fitted parameters, empty when the figures are inconsistent
 * @param findings problems found; an {@link DeviceFinding.Severity#ERROR} comes with empty params
 */
public record MosfetFit(Optional<MosfetParams> params, List<DeviceFinding> findings) {

    /** Relative change of VT0 at which the fixed-point iteration stops (1e-12, far below datasheet precision). */
    public static final double RELATIVE_TOLERANCE = 1e-12;
    /** Iteration limit of the fixed point; it contracts by at least ½ per step for consistent figures. */
    public static final int MAX_ITERATIONS = 200;

    /** Copies the findings list. */
    public MosfetFit {
        java.util.Objects.requireNonNull(params, "params");
        findings = List.copyOf(findings);
    }

    /**
     * Fits β and VT0. Triode at the RDS(on) point: VDS = ID·RDS(on) and
     * ID = β·(VGS − VT0 − VDS/2)·VDS·(1 + λ·VDS); threshold point in saturation:
     * ID(th) = β/2·(VGS(th) − VT0)²·(1 + λ·VGS(th)). The two are solved together by a fixed
     * point on VT0 (the threshold current is small, so VT0 sits just below VGS(th)).
     *
     * @param base parameters whose λ, temperature behaviour and body diode are kept
     * @param rdsOnOhms stated RDS(on), ohms, positive
     * @param rdsOnGateVolts VGS at which RDS(on) is stated, volts
     * @param rdsOnDrainAmps ID at which RDS(on) is stated, amperes, positive
     * @param thresholdGateVolts stated VGS(th), volts
     * @param thresholdDrainAmps ID at which VGS(th) is stated (often 250 µA or 1 mA), amperes, positive
     * @return the fit with findings
     */
    public static MosfetFit fit(MosfetParams base, double rdsOnOhms, double rdsOnGateVolts, double rdsOnDrainAmps,
            double thresholdGateVolts, double thresholdDrainAmps) {
        Checks.positiveFinite(rdsOnOhms, "rdsOnOhms");
        Checks.finite(rdsOnGateVolts, "rdsOnGateVolts");
        Checks.positiveFinite(rdsOnDrainAmps, "rdsOnDrainAmps");
        Checks.finite(thresholdGateVolts, "thresholdGateVolts");
        Checks.positiveFinite(thresholdDrainAmps, "thresholdDrainAmps");
        List<DeviceFinding> findings = new ArrayList<>();
        if (!(rdsOnGateVolts > thresholdGateVolts)) {
            findings.add(new DeviceFinding(DeviceFinding.Severity.ERROR, "mosfet.fit.rdsOnGateBelowThreshold",
                    "RDS(on) is stated at VGS = " + rdsOnGateVolts + " V, not above VGS(th) = "
                            + thresholdGateVolts + " V"));
            return new MosfetFit(Optional.empty(), findings);
        }
        double lambda = base.channelLengthModulationPerVolt();
        double vdsOn = rdsOnDrainAmps * rdsOnOhms;
        double vt0 = thresholdGateVolts;
        double beta = Double.NaN;
        for (int k = 0; k < MAX_ITERATIONS; k++) {
            double overdrive = rdsOnGateVolts - vt0;
            if (!(vdsOn < overdrive)) {
                findings.add(new DeviceFinding(DeviceFinding.Severity.ERROR, "mosfet.fit.rdsOnNotTriode",
                        "RDS(on) point (VDS = " + vdsOn + " V) is not in the triode region for overdrive "
                                + overdrive + " V: check RDS(on), its drain current and VGS(th)"));
                return new MosfetFit(Optional.empty(), findings);
            }
            beta = 1.0 / (rdsOnOhms * (overdrive - 0.5 * vdsOn) * (1.0 + lambda * vdsOn));
            double next = thresholdGateVolts
                    - Math.sqrt(2.0 * thresholdDrainAmps / (beta * (1.0 + lambda * thresholdGateVolts)));
            boolean done = Math.abs(next - vt0) <= RELATIVE_TOLERANCE * Math.max(1.0, Math.abs(next));
            vt0 = next;
            if (done) {
                return new MosfetFit(Optional.of(base.withThresholdAndBeta(vt0, beta)), findings);
            }
        }
        findings.add(new DeviceFinding(DeviceFinding.Severity.ERROR, "mosfet.fit.noConvergence",
                "VT0 and β did not settle; the RDS(on) and VGS(th) figures are nearly contradictory"));
        return new MosfetFit(Optional.empty(), findings);
    }
}
