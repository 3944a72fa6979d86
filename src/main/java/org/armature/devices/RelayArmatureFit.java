package org.armature.devices;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A relay model fitted to datasheet figures: always the threshold model (pick-up and drop-out
 * currents with hysteresis and a constant inductance), and, when the released and attracted
 * inductances are both given and consistent, a {@link MovingArmature}.
 *
 * <p>Fit (DESIGN.md "Relay model"): with the spring's force ratio ρ = S0/ST, pick-up balance at
 * the released stop, ½·Ipu²·K/(T + gi)² = ST, and drop-out balance at the attracted stop,
 * ½·Ido²·K/gi² = S0, give (T + gi)/gi = √ρ·Ipu/Ido =: r, hence gi = T/(r − 1). Then
 * L(T) = L_released and L(0) = L_attracted give K = (La − Lr)·gi·(T + gi)/T and
 * Lσ = Lr − (La − Lr)/(r − 1); ST follows from the pick-up balance and S0 = ρ·ST. Lσ ≥ 0 needs
 * La/Lr ≤ r: otherwise the figures contradict each other and a finding says so.
 *
 * @param thresholds pick-up and drop-out currents, always present
 * @param constantInductanceHenries the inductance to use without a moving armature (L released), H
 * @param moving the electromechanical model, empty when not fitted (see findings)
 * @param findings what was noticed; an ERROR explains an empty {@code moving}
 */
public record RelayArmatureFit(RelayThresholds thresholds, double constantInductanceHenries,
        Optional<MovingArmature> moving, List<DeviceFinding> findings) {

    /**
     * Relative difference below which L attracted counts as equal to L released (constant
     * inductance): 1e-9, far below any measured inductance's precision.
     */
    public static final double EQUAL_INDUCTANCE_RELATIVE_TOLERANCE = 1e-9;

    /** Validates and copies. */
    public RelayArmatureFit {
        Objects.requireNonNull(thresholds, "thresholds");
        Checks.positiveFinite(constantInductanceHenries, "constantInductanceHenries");
        Objects.requireNonNull(moving, "moving");
        findings = List.copyOf(findings);
    }

    /**
     * Fits the relay.
     *
     * @param d the datasheet figures and mechanical choices
     * @return the fit; never throws for inconsistent figures, it reports them as findings
     */
    public static RelayArmatureFit fit(RelayArmatureDatasheet d) {
        Objects.requireNonNull(d, "d");
        List<DeviceFinding> findings = new ArrayList<>();
        RelayThresholds thresholds = new RelayThresholds(d.pickUpAmps(), d.dropOutAmps());
        double lr = d.releasedInductanceHenries();
        double la = d.attractedInductanceHenries();
        if (la == 0.0 || Math.abs(la - lr) <= EQUAL_INDUCTANCE_RELATIVE_TOLERANCE * lr) {
            findings.add(new DeviceFinding(DeviceFinding.Severity.INFO, "relay.fit.constantInductance",
                    "no attracted inductance given: constant inductance " + lr
                            + " H, the armature switches at the pick-up and drop-out currents"));
            return new RelayArmatureFit(thresholds, lr, Optional.empty(), findings);
        }
        if (la < lr) {
            findings.add(new DeviceFinding(DeviceFinding.Severity.ERROR, "relay.fit.attractedBelowReleased",
                    "attractedInductanceHenries " + la + " H is below releasedInductanceHenries " + lr
                            + " H; closing the gap must raise the inductance"));
            return new RelayArmatureFit(thresholds, lr, Optional.empty(), findings);
        }
        double rho = d.springForceRatio();
        double r = Math.sqrt(rho) * d.pickUpAmps() / d.dropOutAmps();
        double travel = d.travelMetres();
        double gi = travel / (r - 1.0);
        double k = (la - lr) * gi * (travel + gi) / travel;
        double leakage = lr - (la - lr) / (r - 1.0);
        if (leakage < 0.0) {
            findings.add(new DeviceFinding(DeviceFinding.Severity.ERROR, "relay.fit.leakageNegative",
                    "attractedInductanceHenries " + la + " H is more than √ρ·Ipu/Ido = " + r
                            + " times releasedInductanceHenries " + lr + " H: the attracted inductance is too high"
                            + " for the pick-up/drop-out ratio (or the drop-out current too low, or ρ too small)"));
            return new RelayArmatureFit(thresholds, lr, Optional.empty(), findings);
        }
        double d1 = travel + gi;
        double springReleased = 0.5 * d.pickUpAmps() * d.pickUpAmps() * k / (d1 * d1);
        MovingArmature moving = new MovingArmature(d.coilResistanceOhms(), leakage, k, gi, travel, springReleased,
                rho * springReleased, d.massKilograms(), d.dampingNewtonSecondsPerMetre(), d.restitution(),
                (1.0 - d.contactSetPointFraction()) * travel);
        return new RelayArmatureFit(thresholds, lr, Optional.of(moving), findings);
    }
}
