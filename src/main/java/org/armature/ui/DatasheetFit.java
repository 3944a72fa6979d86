package org.armature.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.armature.devices.BjtFit;
import org.armature.devices.BjtParams;
import org.armature.devices.BjtPolarity;
import org.armature.devices.DeviceConvergenceException;
import org.armature.devices.DeviceFinding;
import org.armature.devices.DiodeParams;
import org.armature.devices.LogicOutputPin;
import org.armature.devices.MosfetFit;
import org.armature.devices.MosfetParams;
import org.armature.model.ParamKeys;
import org.armature.model.ParamSpec;
import org.armature.model.Part;
import org.armature.netlist.DeviceParameters;
import org.armature.model.PartKind;
import org.armature.ui.edit.Editor;

/**
 * The part sheet's "From datasheet…" helpers, without JavaFX: datasheet figures in, the part's fitted
 * model parameters out as one list of {@link Editor.ValueChange}s (applied as one undoable step).
 *
 * <ul>
 *   <li>NPN and PNP: βF and IS by {@link BjtFit#gainAndSaturationCurrent} from typical hFE at a stated
 *       IC and VCE and VBE(sat) at a stated IC with IC/IB = {@value #SATURATION_FORCED_BETA}, both at
 *       {@link DiodeParams#DATASHEET_TEMPERATURE_KELVIN}. Figures are entered as magnitudes; the signs
 *       of a PNP are applied here. The datasheet's VBE(sat) and VCE are terminal voltages; the drops
 *       across the part's RB, RC and RE are taken off before the fit, which works on the intrinsic
 *       junctions.</li>
 *   <li>N-channel MOSFET: VT0 and β by {@link MosfetFit#fit} from VGS(th) at its test current and
 *       RDS(on) at a stated VGS and ID; the datasheet figures VGS(th), RDS(on) and its VGS are written
 *       as entered.</li>
 *   <li>Drive pin: high level and output resistance by {@link LogicOutputPin#fromTwoPoints} from VOH at
 *       two sourced currents (check-values.md GP-7).</li>
 * </ul>
 * A fit that cannot be made, or whose result lies outside a parameter's range, is a refusal with a
 * message for the user, never an exception.
 */
public final class DatasheetFit {

    /** IC/IB at which datasheets state VBE(sat) (common practice: 10). */
    public static final double SATURATION_FORCED_BETA = 10;

    private DatasheetFit() {
    }

    /**
     * Bipolar datasheet figures, magnitudes in SI units.
     *
     * @param hfe typical DC gain, positive
     * @param hfeCollectorAmps |IC| of the hFE figure, A
     * @param hfeVceVolts |VCE| of the hFE figure, V (often 1 V or 5 V)
     * @param vbeSatVolts |VBE(sat)|, V
     * @param satCollectorAmps |IC| of the VBE(sat) figure (IC/IB = 10), A
     */
    public record BjtFigures(double hfe, double hfeCollectorAmps, double hfeVceVolts, double vbeSatVolts,
                             double satCollectorAmps) {
    }

    /**
     * MOSFET datasheet figures, SI units.
     *
     * @param thresholdVolts VGS(th), V
     * @param thresholdDrainAmps ID at which VGS(th) is stated, A (often 250 µA or 1 mA)
     * @param rdsOnOhms RDS(on), Ω
     * @param rdsOnGateVolts VGS at which RDS(on) is stated, V
     * @param rdsOnDrainAmps ID at which RDS(on) is stated, A
     */
    public record MosfetFigures(double thresholdVolts, double thresholdDrainAmps, double rdsOnOhms,
                                double rdsOnGateVolts, double rdsOnDrainAmps) {
    }

    /**
     * Two VOH points of a logic output, SI units.
     *
     * @param volts1 VOH at {@code amps1}, V
     * @param amps1 first sourced current, A
     * @param volts2 VOH at {@code amps2}, V
     * @param amps2 second sourced current, A, different from {@code amps1}
     */
    public record PinFigures(double volts1, double amps1, double volts2, double amps2) {
    }

    /**
     * Outcome of a fit: the changes to apply, or why there are none.
     *
     * @param changes parameter changes of the part (empty when refused)
     * @param problem the reason for a refusal, for the user; empty when fitted
     */
    public record Result(List<Editor.ValueChange> changes, Optional<String> problem) {
        /** Copies the list. */
        public Result {
            changes = List.copyOf(changes);
        }

        static Result refused(String why) {
            return new Result(List.of(), Optional.of(why));
        }

        /** True when the fit gave changes. */
        public boolean fitted() {
            return problem.isEmpty();
        }
    }

    /** True for the kinds that have a datasheet helper. */
    public static boolean supports(PartKind kind) {
        return kind == PartKind.NPN || kind == PartKind.PNP || kind == PartKind.NMOS || kind == PartKind.DRIVE_PIN;
    }

    /** Fits βF and IS of an NPN or PNP part; its other model parameters are kept. */
    public static Result bjt(Part part, BjtFigures f) {
        if (part.kind() != PartKind.NPN && part.kind() != PartKind.PNP) {
            return Result.refused(part.ref() + " is not a bipolar transistor.");
        }
        double sign = part.kind() == PartKind.NPN ? BjtPolarity.NPN.sign() : BjtPolarity.PNP.sign();
        try {
            BjtParams base = bjtParams(part);
            // the datasheet states terminal voltages; the fit works on the intrinsic junctions, so the
            // drops across RB, RC and RE (series elements in the netlist) are taken off first
            double hfeBaseAmps = f.hfeCollectorAmps() / f.hfe();
            double hfeVce = f.hfeVceVolts() - f.hfeCollectorAmps() * base.collectorResistanceOhms()
                    - (f.hfeCollectorAmps() + hfeBaseAmps) * base.emitterResistanceOhms();
            double satBaseAmps = f.satCollectorAmps() / SATURATION_FORCED_BETA;
            double vbeSat = f.vbeSatVolts() - satBaseAmps * base.baseResistanceOhms()
                    - (f.satCollectorAmps() + satBaseAmps) * base.emitterResistanceOhms();
            if (!(hfeVce > 0 && vbeSat > 0)) {
                return Result.refused("The stated voltages are smaller than the drops across the series "
                        + "resistances RB, RC and RE.");
            }
            BjtParams fit = BjtFit.gainAndSaturationCurrent(base, f.hfe(), sign * f.hfeCollectorAmps(),
                    sign * hfeVce, sign * vbeSat, sign * f.satCollectorAmps(),
                    SATURATION_FORCED_BETA, DiodeParams.DATASHEET_TEMPERATURE_KELVIN);
            return checked(part, List.of(
                    new Editor.ValueChange(part.ref(), ParamKeys.BETA_FORWARD, fit.betaForward()),
                    new Editor.ValueChange(part.ref(), ParamKeys.SATURATION_CURRENT_AMPS, fit.saturationCurrentAmps())));
        } catch (IllegalArgumentException | DeviceConvergenceException e) {
            return Result.refused("No fit: " + e.getMessage());
        }
    }

    /**
     * The bipolar model parameters of an NPN or PNP part, as the netlist builds them (unit emission
     * coefficients, no reverse Early voltage or knee, stated at
     * {@link DiodeParams#DATASHEET_TEMPERATURE_KELVIN}).
     *
     * @throws IllegalArgumentException if the part is not a bipolar transistor
     */
    public static BjtParams bjtParams(Part part) {
        if (part.kind() != PartKind.NPN && part.kind() != PartKind.PNP) {
            throw new IllegalArgumentException(part.ref() + " is not a bipolar transistor");
        }
        return DeviceParameters.bjt(part);
    }

    /** Fits VT0 and β of an N-channel MOSFET part and writes the datasheet figures as entered. */
    public static Result mosfet(Part part, MosfetFigures f) {
        if (part.kind() != PartKind.NMOS) {
            return Result.refused(part.ref() + " is not an N-channel MOSFET.");
        }
        try {
            MosfetParams base = DeviceParameters.mosfet(part);
            MosfetFit fit = MosfetFit.fit(base, f.rdsOnOhms(), f.rdsOnGateVolts(), f.rdsOnDrainAmps(),
                    f.thresholdVolts(), f.thresholdDrainAmps());
            if (fit.params().isEmpty()) {
                return Result.refused(fit.findings().stream().filter(d -> d.severity() == DeviceFinding.Severity.ERROR)
                        .map(DeviceFinding::detail).findFirst().orElse("No fit for these figures."));
            }
            MosfetParams p = fit.params().get();
            return checked(part, List.of(
                    new Editor.ValueChange(part.ref(), ParamKeys.THRESHOLD_VOLTS, p.thresholdVolts()),
                    new Editor.ValueChange(part.ref(), ParamKeys.TRANSCONDUCTANCE_AMPS_PER_VOLT_SQUARED, p.transconductanceAmpsPerVoltSquared()),
                    new Editor.ValueChange(part.ref(), ParamKeys.VGS_TH_MAX_VOLTS, f.thresholdVolts()),
                    new Editor.ValueChange(part.ref(), ParamKeys.RDS_ON_OHMS, f.rdsOnOhms()),
                    new Editor.ValueChange(part.ref(), ParamKeys.RDS_ON_GATE_VOLTS, f.rdsOnGateVolts())));
        } catch (IllegalArgumentException e) {
            return Result.refused("No fit: " + e.getMessage());
        }
    }

    /** Fits the high level and output resistance of a drive pin part. */
    public static Result pin(Part part, PinFigures f) {
        if (part.kind() != PartKind.DRIVE_PIN) {
            return Result.refused(part.ref() + " is not a drive pin.");
        }
        if (!(f.volts1() - f.volts2() > 0 == f.amps2() - f.amps1() > 0)) {
            return Result.refused("VOH must fall as the sourced current rises.");
        }
        try {
            LogicOutputPin pin = LogicOutputPin.fromTwoPoints(f.volts1(), f.amps1(), f.volts2(), f.amps2());
            return checked(part, List.of(
                    new Editor.ValueChange(part.ref(), ParamKeys.HIGH_VOLTS, pin.openCircuitVolts()),
                    new Editor.ValueChange(part.ref(), ParamKeys.OUTPUT_RESISTANCE_OHMS, pin.outputResistanceOhms())));
        } catch (IllegalArgumentException e) {
            return Result.refused("No fit: " + e.getMessage());
        }
    }

    private static Result checked(Part part, List<Editor.ValueChange> changes) {
        List<Editor.ValueChange> out = new ArrayList<>();
        for (Editor.ValueChange c : changes) {
            ParamSpec s = part.kind().params().stream().filter(p -> p.key().equals(c.key())).findFirst()
                    .orElseThrow(() -> new IllegalStateException(part.kind() + " has no parameter " + c.key()));
            if (!s.accepts(c.value())) {
                return Result.refused("The fitted " + s.label() + " (" + c.value() + " " + s.unitSymbol()
                        + ") is outside its range: check the figures.");
            }
            out.add(c);
        }
        return new Result(out, Optional.empty());
    }
}
