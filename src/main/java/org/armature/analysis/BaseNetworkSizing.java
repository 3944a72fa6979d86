package org.armature.analysis;

import org.armature.model.ParamKeys;
import org.armature.model.DriverTopology;
import org.armature.model.StageRoles;
import static org.armature.analysis.Quantities.volts;
import static org.armature.analysis.Quantities.amps;
import static org.armature.analysis.Quantities.ohms;
import static org.armature.analysis.Quantities.ratio;
import static org.armature.analysis.Quantities.celsius;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.armature.devices.LogicOutputPin;
import org.armature.model.Finding;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.units.ESeries;
import org.armature.units.Unit;

/**
 * The sizing assistant: from the relay, supply, pin and part data it computes the drive network
 * and shows the calculation step by step, as an engineer writes it.
 *
 * <p>Bipolar switch (low-side NPN, and both transistors of a level-shifted high side):
 * <ol>
 * <li>worst coil current for the base drive: the coil at its smallest resistance, −tolerance at
 *     the coldest ambient (copper law, RC-6), and the supply at its maximum:
 *     IC = (VS,max − VCE(sat)) / Rcoil,min (BJ-16, BJ-18; check-values.md "beyond the hand calculation" 2);</li>
 * <li>hFE(min) moved to the coldest ambient by (T/Tnom)^XTB (BJ-13); the base current from the
 *     {@link BaseDriveRule} (forced β 10 by default, BJ-15), flagged when it falls short of
 *     IC / hFE(min, cold) (BJ-19);</li>
 * <li>the pull-down: the smallest preferred value at or above VBE(sat) / (f · IB), so that it takes
 *     at most the share f of the base current, and not above Voff / Ileak, so that the leakage
 *     flowing out of the base with the pin floating develops less than Voff (rules and defaults in
 *     {@link SizingOptions});</li>
 * <li>the pin's high level under the real load, V0 − ΔV0 − I·Rout (check-values.md "beyond" 5, GP-7);</li>
 * <li>RB = (VOH − VBE(sat)) / (IB + Ipd), rounded <em>down</em> to the chosen series (more drive,
 *     check-values.md "beyond" 6), then the base current and forced β with both resistors at the ends of
 *     their series' tolerance (PV-7);</li>
 * <li>the largest pin current against the per-pin limit and, times the channels driven, against
 *     the package total (GP-x, check-values.md "beyond" 5).</li>
 * </ol>
 *
 * <p>N-MOSFET: the gate resistor is the smallest preferred value at or above (V0 / Ilim − Rout) / (1 − tol),
 * since at the edge the uncharged gate is a short and the pin sources V0 / (Rout + RG) (but at
 * least {@link SizingOptions#minimumGateOhms()}); the gate pull-down keeps the DC divider loss
 * below {@link SizingOptions#gateDividerLossFraction()} and holds the gate against IGSS; the
 * switch counts as fully on only when RDS(on) is specified at or below the gate voltage available
 * (MO-6, check-values.md "beyond" 7).
 *
 * <p>Darlington channel: the input current (V0 − ΔV0 − 2·VBE) / (Rout + Rext + Rin) (DA-5) against
 * IC / hFE(min) and the pin limits; VCE(sat) from the class values of {@link DarlingtonSaturation}.
 *
 * <p>Finding keys ({@code sizing.*}): {@code not-recognised}, {@code missing-part},
 * {@code below-minimum-gain}, {@code pull-down-conflict}, {@code pin-too-low},
 * {@code pin-current-over-limit}, {@code package-current-over-limit}, {@code high-side-direct},
 * {@code gate-below-threshold}, {@code gate-not-guaranteed-on}, {@code gate-guaranteed-on} (INFO),
 * {@code input-current-short}, {@code drain-current-over-rating}.
 */
public final class BaseNetworkSizing {

    private BaseNetworkSizing() {
    }

    /** Sizes the stage's drive network with the default options (forced β 10, E24). */
    public static SizingResult size(Stage stage) {
        return size(stage, SizingOptions.DEFAULT);
    }

    /**
     * Sizes the stage's drive network.
     *
     * @param stage the stage; not modified (the result proposes values, it does not apply them)
     * @param options the rules to follow
     * @return the calculation, the proposed values and any findings; never throws for user data
     */
    public static SizingResult size(Stage stage, SizingOptions options) {
        return new Run(stage, options).run();
    }

    /** One sizing run. */
    private static final class Run {
        private final Stage stage;
        private final SizingOptions o;
        private final List<SizingStep> steps = new ArrayList<>();
        private final List<Suggestion> suggestions = new ArrayList<>();
        private final List<Finding> findings = new ArrayList<>();
        /** Designators proposed for resistors the stage lacks, so that two missing ones get two names. */
        private final java.util.Set<String> proposed = new java.util.HashSet<>();

        Run(Stage stage, SizingOptions options) {
            this.stage = stage;
            this.o = options;
        }

        SizingResult run() {
            Optional<StageRoles> found = TopologyCheck.recognise(stage);
            if (found.isEmpty()) {
                finding(Severity.WARNING, "sizing.not-recognised", "",
                        "The stage is not one of the four driver stages, so its drive network cannot be sized.");
                return result(Optional.empty());
            }
            StageRoles r = found.get();
            if (r.coilSupplyRef().isEmpty() || r.drivePinRef().isEmpty()) {
                finding(Severity.WARNING, "sizing.missing-part", r.coilSupplyRef().isEmpty() ? r.relayRef() : r.inputRef(),
                        "Sizing needs a coil supply and a logic pin driving the stage.");
                return result(Optional.of(r.topology()));
            }
            Part relay = stage.require(r.relayRef());
            Part supply = stage.require(r.coilSupplyRef().get());
            Part pin = stage.require(r.drivePinRef().get());
            Part sw = stage.require(r.switchRef());
            switch (r.topology()) {
                case LOW_SIDE_NPN -> {
                    double ic = coilCurrent(relay, supply, sw.value(ParamKeys.VCE_SAT_VOLTS), "VCE(sat)");
                    bipolarInput(sw, pin, ic, refOrNew(r.inputResistorRef()), refOrNew(r.inputPullRef()), "");
                }
                case LOW_SIDE_NMOS -> mosfet(relay, supply, sw, pin, r);
                case DARLINGTON_CHANNEL -> darlington(relay, supply, sw, pin, r);
                case HIGH_SIDE_PNP -> highSide(relay, supply, sw, pin, r);
                default -> throw new IllegalStateException("unknown topology " + r.topology());
            }
            return result(Optional.of(r.topology()));
        }

        /**
         * The resistor doing a role, or, when the stage has none, a designator for the one to add:
         * the lowest free "R" number, never a part that is already there (a missing role must not
         * name some other resistor of the drawing).
         */
        private String refOrNew(Optional<String> role) {
            if (role.isPresent()) {
                return role.get();
            }
            for (int i = 1; ; i++) {
                String candidate = "R" + i;
                if (stage.part(candidate).isEmpty() && proposed.add(candidate)) {
                    return candidate;
                }
            }
        }

        private SizingResult result(Optional<DriverTopology> t) {
            return new SizingResult(t, steps, suggestions, findings);
        }

        // ------------------------------------------------------------------ common steps

        /** Steps 1–3: coldest coil, highest supply, largest coil current. */
        private double coilCurrent(Part relay, Part supply, double switchDropVolts, String dropSymbol) {
            double tol = relay.value(ParamKeys.COIL_RESISTANCE_TOLERANCE_PERCENT) / 100;
            double tMin = stage.conditions().ambientMinCelsius();
            double rMin = PartPhysics.coilOhms(relay, 1 - tol, tMin);
            step("coil resistance, coldest", "Rcoil,min = Rcoil·(1 − tol)·(234.5 + Ta,min)/(234.5 + Tref), Ta,min = "
                    + celsius(tMin), rMin, Unit.OHM);
            double vMax = PartPhysics.supplyMax(supply);
            step("supply, maximum", "VS,max = VS·(1 + tol)", vMax, Unit.VOLT);
            double ic = Math.max(0, (vMax - switchDropVolts) / rMin);
            step("coil current, worst case", "IC = (VS,max − " + dropSymbol + ") / Rcoil,min, " + dropSymbol + " = "
                    + volts(switchDropVolts), ic, Unit.AMPERE);
            return ic;
        }

        /**
         * Base network of a grounded-emitter NPN carrying {@code collectorAmps}: base resistor from the
         * pin and pull-down to ground.
         */
        private void bipolarInput(Part q, Part pin, double collectorAmps, String seriesRef, String pullRef,
                                  String prefix) {
            double tMin = stage.conditions().ambientMinCelsius();
            double hfeCold = q.value(ParamKeys.HFE_MIN) * PartPhysics.gainFactor(q, tMin);
            step(prefix + "hFE(min) at the coldest ambient", "hFE(min)·(Ta,min/Tnom)^XTB, hFE(min) = "
                    + ratio(q.value(ParamKeys.HFE_MIN)) + ", XTB = " + ratio(q.value(ParamKeys.GAIN_TEMP_EXPONENT)), hfeCold, Unit.RATIO);
            double ib = o.baseDrive().baseAmps(collectorAmps, hfeCold);
            step(prefix + "base current", o.baseDrive().formula(), ib, Unit.AMPERE);
            double ibMin = collectorAmps / hfeCold;
            if (ib < ibMin) {
                finding(Severity.WARNING, "sizing.below-minimum-gain", q.ref(),
                        "The base current asked for, " + amps(ib) + ", is below IC / hFE(min, cold) = " + amps(ibMin)
                                + ": with a low-gain sample at the coldest ambient " + q.ref()
                                + " does not saturate. Ask for a forced β well below hFE(min).");
            }
            double vbe = q.value(ParamKeys.VBE_SAT_VOLTS);
            double pullOhms = pullDown(q, vbe, ib, pullRef, prefix);
            double ipd = pullOhms > 0 ? vbe / pullOhms : 0;
            double iR = ib + ipd;
            step(prefix + "base resistor current", "IR = IB + Ipd", iR, Unit.AMPERE);
            LogicOutputPin low = PartPhysics.pin(pin, true);
            double voh = low.voltsAt(iR);
            step(prefix + "pin high level under load", "VOH = V0 − ΔV0 − IR·Rout, V0 = " + volts(pin.value(ParamKeys.HIGH_VOLTS))
                    + ", ΔV0 = " + volts(pin.value(ParamKeys.HIGH_TOLERANCE_VOLTS)) + ", Rout = "
                    + ohms(pin.value(ParamKeys.OUTPUT_RESISTANCE_OHMS)), voh, Unit.VOLT);
            step(prefix + "VBE(sat)", "datasheet maximum at IC/IB = 10", vbe, Unit.VOLT);
            double vr = voh - vbe;
            step(prefix + "voltage across the base resistor", "VR = VOH − VBE(sat)", vr, Unit.VOLT);
            if (!(vr > 0)) {
                finding(Severity.ERROR, "sizing.pin-too-low", pin.ref(),
                        pin.ref() + "'s high level under load (" + volts(voh) + ") does not exceed VBE(sat) ("
                                + volts(vbe) + "): no base resistor can drive " + q.ref() + ".");
                return;
            }
            double rb = vr / iR;
            step(prefix + "base resistor", "RB = VR / IR", rb, Unit.OHM);
            ESeries s = o.series();
            double rbPref = s.roundDown(rb);
            step(prefix + "base resistor, preferred", s.name() + ", rounded down (more drive)", rbPref, Unit.OHM);
            suggestions.add(new Suggestion(seriesRef, ParamKeys.RESISTANCE_OHMS, rbPref, s.tolerancePercent(),
                    prefix + "base resistor", "RB = (VOH − VBE(sat)) / (IB + Ipd), rounded down to " + s.name()));
            double tol = s.toleranceFraction();
            double ipdHigh = pullOhms > 0 ? vbe / (pullOhms * (1 - tol)) : 0;
            double ibWorst = (low.openCircuitVolts() - vbe) / (low.outputResistanceOhms() + rbPref * (1 + tol)) - ipdHigh;
            step(prefix + "base current, resistors at tolerance", "IB = (V0 − ΔV0 − VBE(sat)) / (Rout + RB·(1 + tol))"
                    + " − VBE(sat) / (Rpd·(1 − tol))", ibWorst, Unit.AMPERE);
            step(prefix + "forced β achieved", "βforced = IC / IB", collectorAmps / ibWorst, Unit.RATIO);
            if (ibWorst < ibMin) {
                finding(Severity.WARNING, "sizing.below-minimum-gain", q.ref(),
                        "With the resistors at their tolerance the base current falls to " + amps(ibWorst)
                                + ", below IC / hFE(min, cold) = " + amps(ibMin) + ": " + q.ref() + " may not saturate.");
            }
            LogicOutputPin nominal = PartPhysics.pin(pin, false);
            double iPin = (nominal.openCircuitVolts() - vbe) / (nominal.outputResistanceOhms() + rbPref * (1 - tol));
            pinBudget(pin, iPin, prefix + "pin current, largest", "Ipin = (V0 − VBE(sat)) / (Rout + RB·(1 − tol))");
        }

        /** Pull-down for a base at {@code holdVolts} carrying {@code ib}; 0 when none is sized. */
        private double pullDown(Part q, double holdVolts, double ib, String pullRef, String prefix) {
            if (o.pullDownFraction() == 0) {
                return 0;
            }
            String word = q.kind() == PartKind.PNP ? "pull-up" : "pull-down";
            double rMax = o.offVolts() / o.baseLeakageAmps();
            step(prefix + word + ", largest", "Rpd,max = Voff / Ileak, Voff = " + volts(o.offVolts()) + ", Ileak = "
                    + amps(o.baseLeakageAmps()), rMax, Unit.OHM);
            double rMin = holdVolts / (o.pullDownFraction() * ib);
            step(prefix + word + ", smallest", "Rpd,min = VBE(sat) / (f·IB), f = " + ratio(o.pullDownFraction()),
                    rMin, Unit.OHM);
            ESeries s = o.series();
            double pref = s.roundUp(rMin);
            if (pref > rMax) {
                pref = s.roundDown(rMax);
                finding(Severity.WARNING, "sizing.pull-down-conflict", q.ref(),
                        "No " + word + " both takes less than " + ratio(o.pullDownFraction() * 100) + " % of the base current"
                                + " and holds " + q.ref() + " off against leakage; " + ohms(pref)
                                + " favours holding it off.");
            }
            step(prefix + word + ", preferred", s.name() + ", rounded up (less current taken)", pref, Unit.OHM);
            suggestions.add(new Suggestion(pullRef, ParamKeys.RESISTANCE_OHMS, pref, s.tolerancePercent(), prefix + word,
                    "smallest " + s.name() + " value taking ≤ " + ratio(o.pullDownFraction() * 100)
                            + " % of IB, and ≤ Voff / Ileak"));
            double ipd = holdVolts / pref;
            step(prefix + word + " current", "Ipd = VBE(sat) / Rpd", ipd, Unit.AMPERE);
            return pref;
        }

        private void pinBudget(Part pin, double iPin, String label, String formula) {
            step(label, formula, iPin, Unit.AMPERE);
            double limit = pin.value(ParamKeys.PIN_CURRENT_LIMIT_AMPS);
            if (iPin > limit) {
                finding(Severity.WARNING, "sizing.pin-current-over-limit", pin.ref(),
                        pin.ref() + " would source up to " + amps(iPin) + ", above its per-pin limit of " + amps(limit) + ".");
            }
            double channels = pin.value(ParamKeys.CHANNEL_COUNT);
            double total = channels * iPin;
            step("package current, all channels", "Ipkg = channels · Ipin, channels = " + ratio(channels), total,
                    Unit.AMPERE);
            double pkg = pin.value(ParamKeys.PACKAGE_CURRENT_LIMIT_AMPS);
            if (total > pkg) {
                finding(Severity.WARNING, "sizing.package-current-over-limit", pin.ref(),
                        channelWords(channels) + " would draw " + amps(total) + " from " + pin.ref()
                                + "'s package, above its total limit of " + amps(pkg) + ".");
            }
        }

        // ------------------------------------------------------------------ high side

        private void highSide(Part relay, Part supply, Part pnp, Part pin, StageRoles r) {
            if (r.levelShiftRef().isEmpty()) {
                finding(Severity.WARNING, "sizing.high-side-direct", pnp.ref(),
                        pnp.ref() + " is driven straight from " + pin.ref() + ": use an NPN level shift (see the topology"
                                + " check) before sizing.");
                return;
            }
            Part shift = stage.require(r.levelShiftRef().get());
            double ic = coilCurrent(relay, supply, pnp.value(ParamKeys.VCE_SAT_VOLTS), "VCE(sat)");
            String p = pnp.ref() + ": ";
            double tMin = stage.conditions().ambientMinCelsius();
            double hfeCold = pnp.value(ParamKeys.HFE_MIN) * PartPhysics.gainFactor(pnp, tMin);
            step(p + "hFE(min) at the coldest ambient", "hFE(min)·(Ta,min/Tnom)^XTB", hfeCold, Unit.RATIO);
            double ib = o.baseDrive().baseAmps(ic, hfeCold);
            step(p + "base current", o.baseDrive().formula(), ib, Unit.AMPERE);
            if (ib < ic / hfeCold) {
                finding(Severity.WARNING, "sizing.below-minimum-gain", pnp.ref(),
                        "The base current asked for is below IC / hFE(min, cold): " + pnp.ref() + " does not saturate.");
            }
            double veb = pnp.value(ParamKeys.VBE_SAT_VOLTS);
            double pull = pullDown(pnp, veb, ib, refOrNew(r.switchPullUpRef()), p);
            double iR = ib + (pull > 0 ? veb / pull : 0);
            step(p + "base resistor current", "IR = IB + Ipu", iR, Unit.AMPERE);
            double vMin = PartPhysics.supplyMin(supply);
            step("supply, minimum", "VS,min = VS·(1 − tol)", vMin, Unit.VOLT);
            double vr = vMin - veb - shift.value(ParamKeys.VCE_SAT_VOLTS);
            step(p + "voltage across the base resistor", "VR = VS,min − VEB(sat) − VCE(sat)," + shift.ref(), vr, Unit.VOLT);
            if (!(vr > 0)) {
                finding(Severity.ERROR, "sizing.pin-too-low", supply.ref(),
                        "The supply's minimum does not exceed VEB(sat) + VCE(sat): " + pnp.ref() + " cannot be driven.");
                return;
            }
            ESeries s = o.series();
            double rb = vr / iR;
            step(p + "base resistor", "RB = VR / IR", rb, Unit.OHM);
            double rbPref = s.roundDown(rb);
            step(p + "base resistor, preferred", s.name() + ", rounded down (more drive)", rbPref, Unit.OHM);
            suggestions.add(new Suggestion(refOrNew(r.switchBaseResistorRef()), ParamKeys.RESISTANCE_OHMS, rbPref,
                    s.tolerancePercent(), p + "base resistor", "RB = (VS,min − VEB(sat) − VCE(sat)) / (IB + Ipu), rounded down"));
            double ic2 = (PartPhysics.supplyMax(supply) - veb - shift.value(ParamKeys.VCE_SAT_VOLTS))
                    / (rbPref * (1 - s.toleranceFraction()));
            step(shift.ref() + " collector current, largest", "IC2 = (VS,max − VEB(sat) − VCE(sat)) / (RB·(1 − tol))",
                    ic2, Unit.AMPERE);
            bipolarInput(shift, pin, ic2, refOrNew(r.inputResistorRef()), refOrNew(r.inputPullRef()),
                    shift.ref() + ": ");
        }

        // ------------------------------------------------------------------ MOSFET

        private void mosfet(Part relay, Part supply, Part q, Part pin, StageRoles r) {
            double rds = q.value(ParamKeys.RDS_ON_OHMS);
            double ic = coilCurrent(relay, supply, 0, "VDS(on)");
            ESeries s = o.series();
            LogicOutputPin nominal = PartPhysics.pin(pin, false);
            double rgMin = (nominal.openCircuitVolts() / pin.value(ParamKeys.PIN_CURRENT_LIMIT_AMPS) - nominal.outputResistanceOhms())
                    / (1 - s.toleranceFraction());
            step("gate resistor, smallest", "RG,min = (V0 / Ilim − Rout) / (1 − tol) (uncharged gate at the edge)", rgMin,
                    Unit.OHM);
            double rg = s.roundUp(Math.max(rgMin, o.minimumGateOhms()));
            step("gate resistor, preferred", s.name() + ", rounded up, at least " + ohms(o.minimumGateOhms()), rg, Unit.OHM);
            suggestions.add(new Suggestion(refOrNew(r.inputResistorRef()), ParamKeys.RESISTANCE_OHMS, rg, s.tolerancePercent(),
                    "gate resistor", "smallest " + s.name() + " value keeping the gate-charging peak within the pin limit"));
            double peak = nominal.currentInto(rg * (1 - s.toleranceFraction()), 0);
            pinBudget(pin, peak, "pin current, peak at the edge", "Ipk = V0 / (Rout + RG·(1 − tol))");
            double f = o.gateDividerLossFraction();
            double pdMin = (1 - f) / f * (rg + nominal.outputResistanceOhms());
            step("gate pull-down, smallest", "Rpd,min = (1 − f)/f · (RG + Rout), f = " + ratio(f), pdMin, Unit.OHM);
            double pdMax = o.offVolts() / o.gateLeakageAmps();
            step("gate pull-down, largest", "Rpd,max = Voff / IGSS", pdMax, Unit.OHM);
            double pd = s.roundUp(pdMin);
            if (pd > pdMax) {
                pd = s.roundDown(pdMax);
                finding(Severity.WARNING, "sizing.pull-down-conflict", q.ref(),
                        "No gate pull-down both keeps the divider loss small and holds the gate against leakage.");
            }
            step("gate pull-down, preferred", s.name() + ", rounded up", pd, Unit.OHM);
            suggestions.add(new Suggestion(refOrNew(r.inputPullRef()), ParamKeys.RESISTANCE_OHMS, pd, s.tolerancePercent(),
                    "gate pull-down", "smallest " + s.name() + " value losing ≤ " + ratio(f * 100) + " % of the gate drive"));
            LogicOutputPin low = PartPhysics.pin(pin, true);
            double vgs = low.openCircuitVolts() * pd / (pd + rg + low.outputResistanceOhms());
            step("gate voltage available", "VGS = (V0 − ΔV0)·Rpd / (Rpd + RG + Rout)", vgs, Unit.VOLT);
            double th = q.value(ParamKeys.VGS_TH_MAX_VOLTS);
            step("gate overdrive", "VGS − VGS(th),max, VGS(th),max = " + volts(th), vgs - th, Unit.VOLT);
            double spec = q.value(ParamKeys.RDS_ON_GATE_VOLTS);
            if (vgs <= th) {
                finding(Severity.ERROR, "sizing.gate-below-threshold", q.ref(),
                        "The gate voltage available, " + volts(vgs) + ", does not exceed VGS(th) max (" + volts(th) + "): "
                                + q.ref() + " may not turn on at all.");
            } else if (spec > vgs) {
                finding(Severity.WARNING, "sizing.gate-not-guaranteed-on", q.ref(),
                        q.ref() + "'s RDS(on) is specified at VGS = " + volts(spec) + ", above the " + volts(vgs)
                                + " available: not guaranteed on. Choose a MOSFET with RDS(on) specified at or below "
                                + volts(vgs) + " (MO-6).");
            } else {
                finding(Severity.INFO, "sizing.gate-guaranteed-on", q.ref(),
                        q.ref() + "'s RDS(on) ≤ " + ohms(rds) + " is specified at VGS = " + volts(spec) + ", within the "
                                + volts(vgs) + " available.");
                step("drain voltage, on", "VDS = IC · RDS(on)", ic * rds, Unit.VOLT);
            }
            double idMax = q.value(ParamKeys.ID_MAX_AMPS);
            if (ic > idMax) {
                finding(Severity.WARNING, "sizing.drain-current-over-rating", q.ref(),
                        "The coil current " + amps(ic) + " exceeds " + q.ref() + "'s ID max " + amps(idMax) + ".");
            }
        }

        // ------------------------------------------------------------------ Darlington

        private void darlington(Part relay, Part supply, Part u, Part pin, StageRoles r) {
            double tol = relay.value(ParamKeys.COIL_RESISTANCE_TOLERANCE_PERCENT) / 100;
            double guess = PartPhysics.supplyMax(supply) / PartPhysics.coilOhms(relay, 1 - tol,
                    stage.conditions().ambientMinCelsius());
            double ic = coilCurrent(relay, supply, DarlingtonSaturation.typicalVolts(guess), "VCE(sat),typ (DA-2)");
            double hfe = u.value(ParamKeys.HFE_MIN) * PartPhysics.gainFactor(u, stage.conditions().ambientMinCelsius());
            step("channel hFE(min) at the coldest ambient", "hFE(min)·(Ta,min/Tnom)^XTB", hfe, Unit.RATIO);
            double need = ic / hfe;
            step("input current needed", "Iin,min = IC / hFE(min, cold)", need, Unit.AMPERE);
            double rExt = r.inputResistorRef().map(ref -> stage.require(ref).value(ParamKeys.RESISTANCE_OHMS)).orElse(0.0);
            double rin = u.value(ParamKeys.INPUT_RESISTANCE_OHMS);
            LogicOutputPin low = PartPhysics.pin(pin, true);
            double vbe2 = 2 * o.darlingtonVbeVolts();
            double iin = Math.max(0, (low.openCircuitVolts() - vbe2) / (low.outputResistanceOhms() + rExt + rin));
            step("input current available", "Iin = (V0 − ΔV0 − 2·VBE) / (Rout + Rext + Rin), VBE = "
                    + volts(o.darlingtonVbeVolts()) + ", Rin = " + ohms(rin) + ", Rext = " + ohms(rExt), iin, Unit.AMPERE);
            double steal = o.darlingtonVbeVolts() / u.value(ParamKeys.FIRST_BASE_EMITTER_OHMS);
            step("input current into the first base", "Iin − VBE / RBE1", iin - steal, Unit.AMPERE);
            if (iin - steal < need) {
                finding(Severity.WARNING, "sizing.input-current-short", u.ref(),
                        "The channel's input gets " + amps(iin - steal) + " into its first base, less than the "
                                + amps(need) + " its minimum gain needs at the coldest ambient.");
            }
            LogicOutputPin nominal = PartPhysics.pin(pin, false);
            double iPin = Math.max(0, (nominal.openCircuitVolts() - vbe2) / (nominal.outputResistanceOhms() + rExt + rin));
            pinBudget(pin, iPin, "pin current, largest", "Ipin = (V0 − 2·VBE) / (Rout + Rext + Rin)");
            double limit = pin.value(ParamKeys.PIN_CURRENT_LIMIT_AMPS);
            if (iPin > limit) {
                double smallest = PartKind.RESISTOR.param(ParamKeys.RESISTANCE_OHMS).orElseThrow().min();
                double add = o.series().roundUp(Math.max(smallest, (nominal.openCircuitVolts() - vbe2) / limit - rin
                        - nominal.outputResistanceOhms()));
                suggestions.add(new Suggestion(refOrNew(r.inputResistorRef()), ParamKeys.RESISTANCE_OHMS, add,
                        o.series().tolerancePercent(), "input resistor", "smallest value keeping the pin within its limit"));
            }
        }

        // ------------------------------------------------------------------ helpers

        private void step(String label, String formula, double value, Unit unit) {
            steps.add(new SizingStep(label, formula, value, unit));
        }

        private void finding(Severity severity, String key, String ref, String message) {
            findings.add(new Finding(severity, key, ref, "", message));
        }
    }






    /** "1 channel", "6 channels"; a fraction (a share of a package) keeps its digits. */
    static String channelWords(double n) {
        if (n == Math.rint(n) && Math.abs(n) < 1e9) {
            return (long) n + (n == 1 ? " channel" : " channels");
        }
        return org.armature.units.EngineeringNotation.format(n, org.armature.units.Unit.RATIO) + " channels";
    }
}
