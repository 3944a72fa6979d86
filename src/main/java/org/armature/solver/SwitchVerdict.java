package org.armature.solver;

/**
 * Whether the switch (Q1: the switch-kind part with a pin on the {@code switch} net) is driven
 * fully on, with the margin that says by how much.
 *
 * <p>Margins (≥ 1 means fully on at the worst-case datasheet figure):
 * <ul>
 * <li>bipolar: hFE(min)·IB / IC — the base current available over the base current the minimum
 *     gain needs for the collector current (sizing with hFE(min): common practice, check-values.md BJ-19);</li>
 * <li>Darlington channel: hFE(min)·IIN / IC, the same with the channel's input current;</li>
 * <li>N-MOSFET: (VGS − VGS(th)max) / [(VGS,spec − VGS(th)max) + ID·RDS(on)/2]. The datasheet
 *     guarantees RDS(on) at VGS,spec for any threshold up to VGS(th)max. Seen as a square-law
 *     device at the worst threshold, its channel conductance per volt of overdrive is
 *     k = 1/(RDS(on)·(VGS,spec − VGS(th)max)); carrying ID in the triode region at VDS = ID·RDS(on)
 *     needs an overdrive ID/(k·VDS) + VDS/2 = (VGS,spec − VGS(th)max) + ID·RDS(on)/2. The margin
 *     is the overdrive available over that (0 when the gate is below VGS(th)max).</li>
 * </ul>
 * A switch that is cut off gets margin 0, fullyOn false.
 *
 * <p>Immutable, with the accessors, equality and text of a record of its four values; the reason
 * is written out only when first asked for (the checks judge thousands of verdicts by their
 * margin alone).
 */
import java.util.Objects;
import java.util.function.Supplier;

public final class SwitchVerdict {

    private final String ref;
    private final boolean fullyOn;
    private final double margin;
    private final Supplier<String> because;
    private volatile String reason;

    /**
     * @param ref the switch's designator
     * @param fullyOn true when the margin is at least 1 and the switch conducts
     * @param margin the margin as above, dimensionless, finite, ≥ 0
     * @param reason one sentence with the numbers
     */
    public SwitchVerdict(String ref, boolean fullyOn, double margin, String reason) {
        this(ref, fullyOn, margin, () -> reason);
        this.reason = reason;
    }

    /** A verdict whose reason is formatted on first use ({@code reason} must give the same text each time). */
    SwitchVerdict(String ref, boolean fullyOn, double margin, Supplier<String> reason) {
        if (!(margin >= 0) || !Double.isFinite(margin)) {
            throw new IllegalArgumentException("margin must be finite and ≥ 0, was " + margin);
        }
        this.ref = ref;
        this.fullyOn = fullyOn;
        this.margin = margin;
        this.because = reason;
    }

    /** @return the switch's designator */
    public String ref() {
        return ref;
    }

    /** @return true when the margin is at least 1 and the switch conducts */
    public boolean fullyOn() {
        return fullyOn;
    }

    /** @return the margin as above, dimensionless, finite, ≥ 0 */
    public double margin() {
        return margin;
    }

    /** @return one sentence with the numbers */
    public String reason() {
        String r = reason;
        if (r == null) {
            r = because.get();
            reason = r;
        }
        return r;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SwitchVerdict v && Objects.equals(ref, v.ref) && fullyOn == v.fullyOn
                && Double.compare(margin, v.margin) == 0 && Objects.equals(reason(), v.reason());
    }

    @Override
    public int hashCode() {
        return Objects.hash(ref, fullyOn, margin, reason());
    }

    @Override
    public String toString() {
        return "SwitchVerdict[ref=" + ref + ", fullyOn=" + fullyOn + ", margin=" + margin + ", reason=" + reason() + "]";
    }
}
