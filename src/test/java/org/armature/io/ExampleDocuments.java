package org.armature.io;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.UnaryOperator;
import org.armature.model.Conditions;
import org.armature.model.FaultHunt;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;

/**
 * Builds the demo documents in {@code examples/} from the templates with changed values and names.
 * Scenarios and figures are our own (typical values, no particular product). Run {@link #main} to
 * rewrite the files after a deliberate format change; {@code ExamplesTest} checks them.
 */
final class ExampleDocuments {

    private ExampleDocuments() {
    }

    /** Regenerates every example file under the given directory (default {@code examples}). */
    public static void main(String[] args) throws Exception {
        Path dir = Path.of(args.length > 0 ? args[0] : "examples");
        Files.createDirectories(dir);
        for (Map.Entry<String, StageDocument> e : all().entrySet()) {
            StageFiles.save(e.getValue(), dir.resolve(e.getKey()));
        }
    }

    /** File name to document. */
    static Map<String, StageDocument> all() {
        return Map.of(
                "greenhouse-valves.stage.json", greenhouseValves(),
                "dust-extractor-interlock.stage.json", dustExtractorInterlock(),
                "pool-pump-timer.stage.json", poolPumpTimer(),
                "solar-pump-repair.stage.json", solarPumpRepair());
    }

    /** Six 24 V irrigation valve relays from a 3.3 V controller: three ways to build one channel. */
    static StageDocument greenhouseValves() {
        Conditions greenhouse = new Conditions(true, 28, 2, 50);
        UnaryOperator<Part> relay = k -> k.with("ratedVolts", 24).with("coilResistanceOhms", 1550)
                .with("mustOperateVolts", 16.8).with("mustReleaseVolts", 2.4)
                .with("inductanceReleasedHenries", 3.1).with("inductanceAttractedHenries", 6.0)
                .with("coilCapacitanceFarads", 60e-12).with("contactRatedAmps", 5);
        UnaryOperator<Part> controller = u -> u.with("highVolts", 3.45).with("outputResistanceOhms", 55)
                .with("pinCurrentLimitAmps", 0.012).with("packageCurrentLimitAmps", 0.08)
                .with("channelCount", 6);
        UnaryOperator<Stage> common = s -> s
                .updatePart("V1", v -> v.with("volts", 24).with("tolerancePercent", 5))
                .updatePart("K1", relay)
                .updatePart("U1", controller)
                .updatePart("V2", v -> v.with("volts", 24).withOption("waveform", "ac-rms"))
                .updatePart("E1", e -> e.with("resistanceOhms", 96).with("ratedWatts", 6)
                        .withOption("loadKind", "resistive"))
                .withConditions(greenhouse);

        Stage npn = named(common.apply(Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE,
                        HighSideDrive.LEVEL_SHIFT)),
                "Zone valve, NPN channel",
                "One of six 24 V valve relays switched from a 3.3 V greenhouse controller by a small NPN.")
                .updatePart("R1", r -> r.with("resistanceOhms", 1800))
                .updatePart("R2", r -> r.with("resistanceOhms", 33_000))
                .updatePart("Q1", q -> q.with("betaForward", 260).with("hfeMin", 120));

        Stage nmos = named(common.apply(Templates.build(StageTemplate.LOW_SIDE_NMOS, Suppressor.DIODE_ZENER,
                        HighSideDrive.LEVEL_SHIFT)),
                "Zone valve, N-MOSFET channel",
                "The same valve relay on a logic-level N-MOSFET, with a diode and 27 V zener for a quick release.")
                .updatePart("R1", r -> r.with("resistanceOhms", 220))
                .updatePart("R2", r -> r.with("resistanceOhms", 47_000))
                .updatePart("D2", d -> d.with("breakdownVolts", 27))
                .updatePart("Q1", q -> q.with("thresholdVolts", 1.05)
                        .with("transconductanceAmpsPerVoltSquared", 0.4).with("vgsThMaxVolts", 1.4)
                        .with("rdsOnOhms", 2.0).with("rdsOnGateVolts", 2.5));

        Stage array = named(common.apply(Templates.build(StageTemplate.DARLINGTON_CHANNEL, Suppressor.DIODE,
                        HighSideDrive.LEVEL_SHIFT)),
                "Zone valve, Darlington channel",
                "One channel of a Darlington sink array per valve, its clamp diode returned to the 24 V rail.")
                .updatePart("R1", r -> r.with("resistanceOhms", 47))
                .updatePart("U2", u -> u.with("betaForward", 110).with("hfeMin", 800).with("channelCount", 6));

        // the three channels side by side on the same valve relay, supply and controller pin
        return new StageDocument("Greenhouse irrigation valves", List.of(npn, nmos, array),
                java.util.Optional.of(new org.armature.model.LineUp(List.of(0, 1, 2),
                        org.armature.model.LineUpContext.of(npn))));
    }

    /** A workshop dust extractor's interlock relay, sourced from the high side so a broken wire drops it. */
    static StageDocument dustExtractorInterlock() {
        Conditions workshop = new Conditions(true, 18, -10, 45);
        UnaryOperator<Stage> common = s -> s
                .updatePart("V1", v -> v.with("volts", 12).with("tolerancePercent", 8))
                .updatePart("U1", u -> u.with("highVolts", 5.1).with("outputResistanceOhms", 40)
                        .with("pinCurrentLimitAmps", 0.025).with("packageCurrentLimitAmps", 0.15))
                .updatePart("K1", k -> k.with("coilResistanceOhms", 300).with("mustOperateVolts", 8.4)
                        .with("mustReleaseVolts", 1.1).with("inductanceReleasedHenries", 0.9)
                        .with("inductanceAttractedHenries", 1.9).with("operateTimeSeconds", 0.007)
                        .with("releaseTimeSeconds", 0.003))
                .updatePart("Q1", q -> q.with("betaForward", 230).with("hfeMin", 140))
                .updatePart("V2", v -> v.with("volts", 24))
                .updatePart("E1", e -> e.with("resistanceOhms", 120).with("ratedWatts", 4.8)
                        .withOption("loadKind", "resistive"))
                .withConditions(workshop);
        UnaryOperator<Stage> levelShift = s -> s
                .updatePart("R1", r -> r.with("resistanceOhms", 10_000))
                .updatePart("R2", r -> r.with("resistanceOhms", 56_000))
                .updatePart("R3", r -> r.with("resistanceOhms", 15_000))
                .updatePart("R4", r -> r.with("resistanceOhms", 2700))
                .updatePart("Q2", q -> q.with("betaForward", 250).with("hfeMin", 150));

        Stage zener = named(levelShift.apply(common.apply(Templates.build(StageTemplate.HIGH_SIDE_PNP,
                        Suppressor.DIODE_ZENER, HighSideDrive.LEVEL_SHIFT))),
                "Interlock relay, diode + zener",
                "Blast-gate switch input from a 5 V controller; the relay enables the extractor's 24 V contactor.")
                .updatePart("D2", d -> d.with("breakdownVolts", 15));

        Stage tvs = named(levelShift.apply(common.apply(Templates.build(StageTemplate.HIGH_SIDE_PNP,
                        Suppressor.TVS, HighSideDrive.LEVEL_SHIFT))),
                "Interlock relay, TVS",
                "The same interlock with an 18 V bidirectional TVS across the coil.")
                .updatePart("D1", d -> d.with("breakdownVolts", 18));

        Stage direct = named(common.apply(Templates.build(StageTemplate.HIGH_SIDE_PNP, Suppressor.DIODE,
                        HighSideDrive.DIRECT)),
                "Direct drive, for comparison",
                "The PNP driven straight from the 5 V pin: with a 12 V coil supply it cannot turn off.")
                .updatePart("R1", r -> r.with("resistanceOhms", 2700))
                .updatePart("R2", r -> r.with("resistanceOhms", 15_000));

        return new StageDocument("Workshop dust-extractor interlock", List.of(zener, tvs, direct));
    }

    /** A pool pump switched at mains from a 3.3 V timer: the contact side is above extra-low voltage. */
    static StageDocument poolPumpTimer() {
        Stage s = named(Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE_ZENER, HighSideDrive.LEVEL_SHIFT),
                "Pump relay",
                "A 3.3 V timer switching the 230 V filter pump of a garden pool through a 12 V, 16 A relay.")
                .updatePart("V1", v -> v.with("volts", 12).with("tolerancePercent", 5))
                .updatePart("U1", u -> u.with("highVolts", 3.45).with("outputResistanceOhms", 60))
                .updatePart("R1", r -> r.with("resistanceOhms", 820))
                .updatePart("R2", r -> r.with("resistanceOhms", 15_000))
                .updatePart("Q1", q -> q.with("betaForward", 240).with("hfeMin", 120))
                .updatePart("D2", d -> d.with("breakdownVolts", 15))
                .updatePart("K1", k -> k.with("coilResistanceOhms", 360).with("mustOperateVolts", 8.4)
                        .with("mustReleaseVolts", 1.0).with("inductanceReleasedHenries", 0.75)
                        .with("inductanceAttractedHenries", 1.6).with("contactRatedVolts", 277)
                        .with("contactRatedAmps", 16).with("coilThermalResistanceKelvinPerWatt", 90))
                .updatePart("V2", v -> v.with("volts", 230).with("tolerancePercent", 10)
                        .withOption("waveform", "ac-rms"))
                .updatePart("E1", e -> e.with("resistanceOhms", 70.5).with("ratedWatts", 750)
                        .withOption("loadKind", "resistive"))
                .withConditions(new Conditions(true, 30, -5, 55));
        return new StageDocument("Pool pump timer", List.of(s));
    }

    /**
     * A repair log: the circulation pump of a solar water heater runs day and night, and the
     * technician's fault hunt on its relay channel. Demo data: the scenario is invented and the
     * readings are made-up figures of the kind a 4,000-count meter shows on such a fault (rounded
     * to its resolution), not measurements of a real board.
     */
    static StageDocument solarPumpRepair() {
        Stage s = named(Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT),
                "Pump relay channel",
                "Demo data, an invented repair: the 12 V circulation pump of a solar water heater runs day and "
                        + "night. The controller's 3.3 V pin switches the 12 V pump relay through a small NPN.")
                .updatePart("V1", v -> v.with("volts", 12).with("tolerancePercent", 5))
                .updatePart("U1", u -> u.with("highVolts", 3.4).with("outputResistanceOhms", 65))
                .updatePart("R1", r -> r.with("resistanceOhms", 1500))
                .updatePart("R2", r -> r.with("resistanceOhms", 22_000))
                .updatePart("Q1", q -> q.with("betaForward", 250).with("hfeMin", 110))
                .updatePart("K1", k -> k.with("coilResistanceOhms", 320).with("mustOperateVolts", 8.4)
                        .with("mustReleaseVolts", 1.2).with("inductanceReleasedHenries", 0.8)
                        .with("inductanceAttractedHenries", 1.7))
                .updatePart("V2", v -> v.with("volts", 12).with("tolerancePercent", 10))
                .updatePart("E1", e -> e.with("resistanceOhms", 7.2).with("ratedWatts", 20)
                        .withOption("loadKind", "motor"))
                .withConditions(new Conditions(false, 35, 0, 60));
        // what the technician entered so far: the relay stays operated with the pin low, and two
        // readings with the pin low; they had seen this channel's transistor fail before, so they
        // weighed a collector-emitter short higher than its default
        FaultHunt hunt = FaultHunt.start(0)
                .withSymptom(Optional.of("no-release"))
                .withReadings(List.of(
                        new FaultHunt.HuntReading("coil", false, 11.99),
                        new FaultHunt.HuntReading("contact-no", false, 11.88)))
                .withPriorWeights(Map.of("ce-short", 3.0));
        return new StageDocument("Solar water heater pump: repair log", List.of(s)).withFaultHunt(Optional.of(hunt));
    }

    private static Stage named(Stage s, String name, String description) {
        return new Stage(name, description, s.parts(), s.wires(), s.testPoints(), s.conditions());
    }
}
