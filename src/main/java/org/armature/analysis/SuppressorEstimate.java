package org.armature.analysis;

import org.armature.model.ParamKeys;
import org.armature.model.StageRoles;
import java.util.List;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Stage;

/**
 * The closed-form turn-off of a coil through its suppressor (check-values.md, "Suppression and kickback"):
 * the coil (L, R, initial current I0) discharges through a clamp of constant voltage Vc in series
 * with a resistance Rs, so with R' = R + Rs and τ' = L/R'
 * <pre>
 *   i(t) = (I0 + Vc/R')·e^(−t/τ') − Vc/R'
 *   t(i) = τ'·ln((I0 + Vc/R') / (i + Vc/R'))
 *   peak switch voltage = VS + Vc + I0·Rs
 * </pre>
 * A plain diode clamps at its forward drop, a diode + zener at VZ + VF, a TVS at its breakdown, a
 * resistor is Rs with Vc = 0, an RC snubber is judged by its resistor alone (its capacitor only
 * lowers the first peak), a Darlington channel's clamp diode by its forward drop (plus a zener in the
 * common line). With no suppressor the voltage is limited only by breakdown or arcing (SU-0, SU-1).
 *
 * @param description plain words ("diode + 12 V zener")
 * @param clampVolts Vc, volts (0 for a resistor); infinite when nothing clamps
 * @param seriesOhms Rs, ohms
 * @param refs the parts forming the suppressor
 */
public record SuppressorEstimate(String description, double clampVolts, double seriesOhms, List<String> refs) {

    public SuppressorEstimate {
        refs = List.copyOf(refs);
        if (!(clampVolts >= 0) || !(seriesOhms >= 0)) {
            throw new IllegalArgumentException("clampVolts and seriesOhms must not be negative");
        }
    }

    /** True when something limits the turn-off voltage. */
    public boolean clamps() {
        return Double.isFinite(clampVolts);
    }

    /**
     * The suppressor found by the topology check, as a constant clamp plus a resistance.
     *
     * @param stage the stage
     * @param roles its recognised roles
     * @param forwardDropVolts forward drop of a conducting diode, volts
     */
    public static SuppressorEstimate of(Stage stage, StageRoles roles, double forwardDropVolts) {
        List<Part> parts = roles.suppressorRefs().stream().map(stage::require).toList();
        if (parts.isEmpty()) {
            return new SuppressorEstimate("none", Double.POSITIVE_INFINITY, 0, List.of());
        }
        double vc = 0;
        double rs = 0;
        boolean linear = false;
        StringBuilder words = new StringBuilder();
        for (Part p : parts) {
            String w;
            switch (p.kind()) {
                case DIODE -> {
                    vc += forwardDropVolts;
                    w = "diode";
                }
                case ZENER -> {
                    // a zener entered at its cathode from the coil's high end breaks down; otherwise it conducts forward
                    boolean breaks = parts.size() > 1;
                    vc += breaks ? p.value(ParamKeys.BREAKDOWN_VOLTS) : forwardDropVolts;
                    w = breaks ? Quantities.volts(p.value(ParamKeys.BREAKDOWN_VOLTS)) + " zener" : "zener (as a diode)";
                }
                case TVS -> {
                    vc += p.value(ParamKeys.BREAKDOWN_VOLTS);
                    w = Quantities.volts(p.value(ParamKeys.BREAKDOWN_VOLTS)) + " TVS";
                }
                case RESISTOR -> {
                    rs += p.value(ParamKeys.RESISTANCE_OHMS);
                    linear = true;
                    w = Quantities.ohms(p.value(ParamKeys.RESISTANCE_OHMS)) + " resistor";
                }
                case CAPACITOR -> w = "capacitor";
                case DARLINGTON -> {
                    vc += forwardDropVolts;
                    w = "channel clamp diode";
                }
                default -> w = p.kind().title();
            }
            if (words.length() > 0) {
                words.append(" + ");
            }
            words.append(w);
        }
        if (linear && parts.stream().anyMatch(p -> p.kind() == PartKind.CAPACITOR)) {
            words.append(" (RC snubber, judged by its resistor)");
        }
        return new SuppressorEstimate(words.toString(), vc, rs, roles.suppressorRefs());
    }

    /**
     * Time for the coil current to fall from {@code initialAmps} to {@code toAmps}.
     *
     * @param coilOhms R, ohms
     * @param henries L, henries
     * @param initialAmps I0, amperes
     * @param toAmps the current to reach (drop-out, or 10 % of I0), amperes, below I0
     * @return seconds; infinite when nothing clamps (the closed form does not apply)
     */
    public double decaySeconds(double coilOhms, double henries, double initialAmps, double toAmps) {
        if (!clamps()) {
            return Double.POSITIVE_INFINITY;
        }
        double r = coilOhms + seriesOhms;
        double tau = henries / r;
        double offset = clampVolts / r;
        return tau * Math.log((initialAmps + offset) / (Math.max(toAmps, 0) + offset));
    }

    /** Peak voltage across the switch at turn-off, VS + Vc + I0·Rs, volts (infinite without a clamp). */
    public double peakSwitchVolts(double supplyVolts, double initialAmps) {
        return supplyVolts + clampVolts + initialAmps * seriesOhms;
    }

    /** Peak current through the suppressor: the coil current at turn-off, amperes. */
    public double peakCurrentAmps(double initialAmps) {
        return initialAmps;
    }
}
