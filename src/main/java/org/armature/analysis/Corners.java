package org.armature.analysis;

import org.armature.model.ParamKeys;
import org.armature.model.StageRoles;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Optional;
import java.util.SplittableRandom;
import org.armature.model.Conditions;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.units.ESeries;
import org.armature.units.PhysicalConstants;
import org.armature.units.Unit;

/**
 * The toleranced parameters of a stage, every corner of them, and seeded Monte Carlo samples.
 *
 * <p>Factors (each a what-if change of the document, see {@link Factor}):
 * <ul>
 * <li>{@code supply}: the coil supply at VS·(1 ± tol);</li>
 * <li>{@code ambient}: from {@link Conditions#ambientMinCelsius()} to the maximum (coil
 *     temperature, VBE and leakage follow in the solver);</li>
 * <li>{@code coil-resistance}: Rcoil·(1 ± tol) at the reference temperature;</li>
 * <li>{@code gain}: the transistors' gain with the sample spread <em>and</em> the temperature
 *     range folded in, so that a corner can pair the lowest gain with the hottest coil (the stacked
 *     worst case of the operate check): βF from hFE(min)·(Ta,min/Tnom)^XTB at −1 (BJ-13) to
 *     (2·βF − hFE(min))·(Ta,max/Tnom)^XTB at +1 (hFE 100…300 for a typical 200, BJ-20), with XTB
 *     set to 0 so the solver does not scale it again. A Darlington channel's two transistors each
 *     get √hFE(min) … 2·βF − √hFE(min) and keep the solver's temperature scaling;</li>
 * <li>{@code vbe}: VBE ± {@link CornerOptions#vbeSpreadVolts()} by IS·exp(∓ΔV/VT); for a MOSFET
 *     {@code threshold}, VT0 from 2·VT0 − VGS(th),max to VGS(th),max;</li>
 * <li>{@code pin-level}: the pin's open-circuit high level from V0 − ΔV0 (−1) to V0 (+1);</li>
 * <li>{@code resistor:Rn}: each resistor at R·(1 ± tol), the tolerance as entered, or, when none
 *     was entered, that of the finest of E24, E48, E96, E192 holding the value (IEC 60063, PV-7).</li>
 * </ul>
 * Factors with no spread are left out. The full factorial 2^k has at least 64 corners for every
 * template; when it would exceed {@link CornerOptions#maxCorners()} the resistors become one factor.
 */
public final class Corners {

    private Corners() {
    }

    /** The corner plan with the default options. */
    public static CornerPlan enumerate(Stage stage) {
        return enumerate(stage, CornerOptions.DEFAULT);
    }

    /**
     * Every combination of every factor at its limits.
     *
     * @param stage the nominal stage; not modified
     * @param options what to vary
     * @return the factors and the 2^k corners, corner i having factor j at +1 when bit j of i is set
     */
    public static CornerPlan enumerate(Stage stage, CornerOptions options) {
        List<Factor> factors = factors(stage, options);
        int k = factors.size();
        int n = 1 << k;
        // corner i applies factor 0, 1, ... k−1 in turn, at the level of bit j of i; corners that
        // agree in bits 0..j share the stage after factor j, so each layer applies every factor
        // once per distinct prefix (2^(k+1) − 2 applications instead of k·2^k), giving the same stages
        Stage[] layer = {stage};
        for (int j = 0; j < k; j++) {
            Factor f = factors.get(j);
            int width = layer.length;
            Stage[] next = new Stage[2 * width];
            for (int q = 0; q < width; q++) {
                next[q] = f.apply(layer[q], -1.0);
                next[q + width] = f.apply(layer[q], 1.0);
            }
            layer = next;
        }
        List<Variant> corners = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            Map<String, Double> levels = new LinkedHashMap<>();
            for (int j = 0; j < k; j++) {
                levels.put(factors.get(j).id(), ((i >> j) & 1) == 1 ? 1.0 : -1.0);
            }
            corners.add(new Variant(i, levels, layer[i]));
        }
        return new CornerPlan(factors, corners);
    }

    /**
     * Seeded Monte Carlo samples: each factor drawn from its {@link Spread}, independently.
     *
     * @param stage the nominal stage; not modified
     * @param factors the factors to draw (usually {@link CornerPlan#factors()})
     * @param count number of samples, zero or more
     * @param seed the same seed gives the same samples
     * @return the samples in order
     */
    public static List<Variant> monteCarlo(Stage stage, List<Factor> factors, int count, long seed) {
        List<Variant> out = new ArrayList<>(Math.max(0, count));
        monteCarloSamples(stage, factors, count, seed).forEachRemaining(out::add);
        return out;
    }

    /**
     * The samples of {@link #monteCarlo} one at a time, each built when asked for (a caller that
     * judges each sample and drops it keeps one sample's stage alive instead of all of them).
     *
     * @param stage the nominal stage; not modified
     * @param factors the factors to draw
     * @param count number of samples, zero or more
     * @param seed the same seed gives the same samples as {@link #monteCarlo}
     * @return the samples in order
     */
    public static Iterator<Variant> monteCarloSamples(Stage stage, List<Factor> factors, int count, long seed) {
        if (count < 0) {
            throw new IllegalArgumentException("count must not be negative: " + count);
        }
        SplittableRandom random = new SplittableRandom(seed);
        List<Factor> fs = List.copyOf(factors);
        return new Iterator<>() {
            private int i;

            @Override
            public boolean hasNext() {
                return i < count;
            }

            @Override
            public Variant next() {
                if (i >= count) {
                    throw new NoSuchElementException("all " + count + " samples drawn");
                }
                Map<String, Double> levels = new LinkedHashMap<>();
                Stage s = stage;
                for (Factor f : fs) {
                    double level = f.spread().draw(random);
                    levels.put(f.id(), level);
                    s = f.apply(s, level);
                }
                return new Variant(i++, levels, s);
            }
        };
    }

    /** The stage with every factor at given levels (missing ids stay nominal: level 0 is not applied). */
    public static Stage at(Stage stage, List<Factor> factors, Map<String, Double> levels) {
        Stage s = stage;
        for (Factor f : factors) {
            Double level = levels.get(f.id());
            if (level != null) {
                s = f.apply(s, level);
            }
        }
        return s;
    }

    /** The factors of a stage with the default options. */
    public static List<Factor> factors(Stage stage) {
        return factors(stage, CornerOptions.DEFAULT);
    }

    /**
     * The toleranced parameters of a stage, in a stable order.
     *
     * @param stage the nominal stage
     * @param options what to vary
     * @return the factors; empty parts of the list are simply left out (no relay: no coil factor)
     */
    public static List<Factor> factors(Stage stage, CornerOptions options) {
        Optional<StageRoles> roles = TopologyCheck.recognise(stage);
        List<Factor> out = new ArrayList<>();
        Optional<Part> supply = roles.flatMap(StageRoles::coilSupplyRef).flatMap(stage::part);
        supply.ifPresent(v -> {
            double tol = v.value(ParamKeys.TOLERANCE_PERCENT) / 100;
            double volts = v.value(ParamKeys.VOLTS);
            if (tol > 0) {
                out.add(new Factor("supply", "coil supply " + v.ref(), Unit.VOLT, List.of(v.ref()), Spread.NORMAL_3_SIGMA,
                        u -> volts * (1 + u * tol), (s, u) -> s.updatePart(v.ref(), p -> p.with(ParamKeys.VOLTS, volts * (1 + u * tol)))));
            }
        });
        Conditions c = stage.conditions();
        double tMin = c.ambientMinCelsius();
        double tMax = c.ambientMaxCelsius();
        if (tMax > tMin) {
            double mid = (tMin + tMax) / 2;
            double half = (tMax - tMin) / 2;
            out.add(new Factor("ambient", "ambient", Unit.CELSIUS, List.of(), Spread.UNIFORM, u -> mid + u * half,
                    (s, u) -> s.withConditions(new Conditions(s.conditions().pinHigh(), mid + u * half, tMin, tMax))));
        }
        Optional<Part> relay = roles.map(StageRoles::relayRef).flatMap(stage::part);
        relay.ifPresent(k -> {
            double tol = k.value(ParamKeys.COIL_RESISTANCE_TOLERANCE_PERCENT) / 100;
            double ohms = k.value(ParamKeys.COIL_RESISTANCE_OHMS);
            if (tol > 0) {
                out.add(new Factor("coil-resistance", "coil resistance " + k.ref(), Unit.OHM, List.of(k.ref()),
                        Spread.NORMAL_3_SIGMA, u -> ohms * (1 + u * tol),
                        (s, u) -> s.updatePart(k.ref(), p -> p.with(ParamKeys.COIL_RESISTANCE_OHMS, ohms * (1 + u * tol)))));
            }
        });
        List<Part> transistors = new ArrayList<>();
        roles.ifPresent(r -> {
            stage.part(r.switchRef()).ifPresent(transistors::add);
            r.levelShiftRef().flatMap(stage::part).ifPresent(transistors::add);
        });
        List<Part> bipolar = transistors.stream().filter(p -> p.kind() != PartKind.NMOS).toList();
        if (!bipolar.isEmpty()) {
            out.add(gain(bipolar, tMin, tMax));
            if (options.vbeSpreadVolts() > 0) {
                out.add(vbe(bipolar, options.vbeSpreadVolts()));
            }
        }
        transistors.stream().filter(p -> p.kind() == PartKind.NMOS).findFirst().ifPresent(q -> {
            double nom = q.value(ParamKeys.THRESHOLD_VOLTS);
            double max = Math.max(nom, q.value(ParamKeys.VGS_TH_MAX_VOLTS));
            double span = max - nom;
            if (span > 0) {
                double floor = q.kind().param(ParamKeys.THRESHOLD_VOLTS).orElseThrow().min();
                out.add(new Factor("threshold", "gate threshold " + q.ref(), Unit.VOLT, List.of(q.ref()),
                        Spread.NORMAL_3_SIGMA, u -> Math.max(floor, nom + u * span),
                        (s, u) -> s.updatePart(q.ref(), p -> p.with(ParamKeys.THRESHOLD_VOLTS, Math.max(floor, nom + u * span)))));
            }
        });
        Optional<Part> pin = roles.flatMap(StageRoles::drivePinRef).flatMap(stage::part);
        pin.ifPresent(u1 -> {
            double high = u1.value(ParamKeys.HIGH_VOLTS);
            double tol = u1.value(ParamKeys.HIGH_TOLERANCE_VOLTS);
            if (tol > 0) {
                out.add(new Factor("pin-level", "pin high level " + u1.ref(), Unit.VOLT, List.of(u1.ref()), Spread.UNIFORM,
                        u -> high - tol * (1 - u) / 2,
                        (s, u) -> s.updatePart(u1.ref(), p -> p.with(ParamKeys.HIGH_VOLTS, high - tol * (1 - u) / 2))));
            }
        });
        if (options.includeResistors()) {
            List<Factor> resistors = new ArrayList<>();
            for (Part r : stage.parts()) {
                if (r.kind() != PartKind.RESISTOR) {
                    continue;
                }
                double tol = resistorTolerancePercent(r) / 100;
                double ohms = r.value(ParamKeys.RESISTANCE_OHMS);
                if (tol > 0) {
                    resistors.add(new Factor("resistor:" + r.ref(), "resistor " + r.ref(), Unit.OHM, List.of(r.ref()),
                            Spread.NORMAL_3_SIGMA, u -> ohms * (1 + u * tol),
                            (s, u) -> s.updatePart(r.ref(), p -> p.with(ParamKeys.RESISTANCE_OHMS, ohms * (1 + u * tol)))));
                }
            }
            if ((1L << (out.size() + resistors.size())) <= options.maxCorners()) {
                out.addAll(resistors);
            } else if (!resistors.isEmpty()) {
                out.add(groupedResistors(stage, roles, resistors));
            }
        }
        return List.copyOf(out);
    }

    /**
     * A resistor's tolerance: as entered, else that of the finest of E24, E48, E96, E192 whose
     * values include it (IEC 60063, PV-7), else the kind's default.
     */
    public static double resistorTolerancePercent(Part resistor) {
        if (resistor.values().containsKey(ParamKeys.TOLERANCE_PERCENT)) {
            return resistor.value(ParamKeys.TOLERANCE_PERCENT);
        }
        double ohms = resistor.value(ParamKeys.RESISTANCE_OHMS);
        for (ESeries s : List.of(ESeries.E24, ESeries.E48, ESeries.E96, ESeries.E192)) {
            if (s.contains(ohms)) {
                return s.tolerancePercent();
            }
        }
        return resistor.value(ParamKeys.TOLERANCE_PERCENT);
    }

    private static Factor gain(List<Part> bipolar, double tMin, double tMax) {
        List<String> refs = bipolar.stream().map(Part::ref).toList();
        Part first = bipolar.get(0);
        return new Factor("gain", "transistor gain " + String.join(", ", refs), Unit.RATIO, refs, Spread.UNIFORM,
                u -> gainAt(first, u, tMin, tMax), (s, u) -> {
                    Stage out = s;
                    for (Part q : bipolar) {
                        double beta = gainAt(q, u, tMin, tMax);
                        out = out.updatePart(q.ref(), p -> q.kind() == PartKind.DARLINGTON ? p.with(ParamKeys.BETA_FORWARD, beta)
                                : p.with(ParamKeys.BETA_FORWARD, beta).with(ParamKeys.GAIN_TEMP_EXPONENT, 0));
                    }
                    return out;
                });
    }

    /** βF of one transistor at a gain level (see the class comment). */
    private static double gainAt(Part q, double u, double tMin, double tMax) {
        double w = (u + 1) / 2;
        if (q.kind() == PartKind.DARLINGTON) {
            double low = Math.sqrt(q.value(ParamKeys.HFE_MIN));
            double high = Math.max(low, 2 * q.value(ParamKeys.BETA_FORWARD) - low);
            return low + w * (high - low);
        }
        double min = q.value(ParamKeys.HFE_MIN);
        double low = min * PartPhysics.gainFactor(q, tMin);
        double high = Math.max(min, 2 * q.value(ParamKeys.BETA_FORWARD) - min) * PartPhysics.gainFactor(q, tMax);
        return Math.max(1, low + w * (high - low));
    }

    private static Factor vbe(List<Part> bipolar, double spreadVolts) {
        List<String> refs = bipolar.stream().map(Part::ref).toList();
        double vt = PhysicalConstants.thermalVoltageAtCelsius(25);
        return new Factor("vbe", "VBE spread " + String.join(", ", refs), Unit.VOLT, refs, Spread.NORMAL_3_SIGMA,
                u -> u * spreadVolts, (s, u) -> {
                    Stage out = s;
                    for (Part q : bipolar) {
                        double is = q.value(ParamKeys.SATURATION_CURRENT_AMPS) * Math.exp(-u * spreadVolts / vt);
                        out = out.updatePart(q.ref(), p -> p.with(ParamKeys.SATURATION_CURRENT_AMPS, is));
                    }
                    return out;
                }).describedAs("vbe shift");
    }

    /**
     * One factor for all resistors: at +1 the drive is weakest (series resistors up, resistors to
     * ground or to the emitter down).
     */
    private static Factor groupedResistors(Stage stage, Optional<StageRoles> roles, List<Factor> resistors) {
        List<String> pulls = new ArrayList<>();
        roles.ifPresent(r -> {
            r.inputPullRef().ifPresent(pulls::add);
            r.switchPullUpRef().ifPresent(pulls::add);
        });
        List<String> refs = resistors.stream().flatMap(f -> f.refs().stream()).toList();
        return new Factor("resistors", "resistors " + String.join(", ", refs), Unit.RATIO, refs, Spread.NORMAL_3_SIGMA,
                u -> u, (s, u) -> {
                    Stage out = s;
                    for (Factor f : resistors) {
                        boolean pull = pulls.contains(f.refs().get(0));
                        out = f.apply(out, pull ? -u : u);
                    }
                    return out;
                });
    }
}
