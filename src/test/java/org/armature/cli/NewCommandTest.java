package org.armature.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import org.armature.io.StageFiles;
import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.EnumSource;

class NewCommandTest {

    @TempDir
    Path dir;

    private CliRun newStage(String argsBefore, Path file) {
        List<String> args = new ArrayList<>(List.of("new"));
        args.addAll(Arrays.asList(argsBefore.trim().split("\\s+")));
        args.add("-o");
        args.add(file.toString());
        return CliRun.of(args.toArray(String[]::new));
    }

    @ParameterizedTest
    @EnumSource(StageTemplate.class)
    @DisplayName("new TEMPLATE writes exactly the template's stage (diode, level shift) and says so")
    void eachTemplate(StageTemplate t) {
        Path file = dir.resolve(t.id() + ".stage.json");
        CliRun r = newStage(t.id(), file);
        assertEquals(0, r.status(), r.err());
        assertEquals("", r.err());
        assertTrue(r.out().contains("Wrote " + t.title()), r.out());
        assertEquals(StageDocument.of(Templates.build(t)), StageFiles.open(file));
    }

    @ParameterizedTest(name = "{0} {1} {2}")
    @CsvSource(delimiter = '|', textBlock = """
            # template and variant                 | option                      | text  | ref | key                                  | SI value (derived from the text)
            low-side-npn                           | --supply                    | 24    | V1  | volts                                | 24
            low-side-npn                           | --supply                    | 5 V   | V1  | volts                                | 5
            low-side-npn                           | --coil-rated-voltage        | 24    | K1  | ratedVolts                           | 24
            low-side-npn                           | --coil-resistance           | 1k5   | K1  | coilResistanceOhms                   | 1500
            low-side-npn                           | --coil-inductance           | 850m  | K1  | inductanceReleasedHenries            | 0.85
            low-side-npn                           | --coil-inductance-attracted | 1.9   | K1  | inductanceAttractedHenries           | 1.9
            low-side-npn                           | --coil-capacitance          | 47p   | K1  | coilCapacitanceFarads                | 47e-12
            low-side-npn                           | --must-operate              | 8.4   | K1  | mustOperateVolts                     | 8.4
            low-side-npn                           | --must-release              | 1.1   | K1  | mustReleaseVolts                     | 1.1
            low-side-npn                           | --coil-thermal-resistance   | 0     | K1  | coilThermalResistanceKelvinPerWatt   | 0
            low-side-npn                           | --reference-temperature     | 23    | K1  | referenceTemperatureCelsius          | 23
            low-side-npn                           | --pin-high                  | 3.4   | U1  | highVolts                            | 3.4
            low-side-npn                           | --pin-low                   | 50m   | U1  | lowVolts                             | 0.05
            low-side-npn                           | --pin-resistance            | 60    | U1  | outputResistanceOhms                 | 60
            low-side-npn                           | --base-resistor             | 1k8   | R1  | resistanceOhms                       | 1800
            low-side-npn                           | --pull-down                 | 33k   | R2  | resistanceOhms                       | 33000
            low-side-npn                           | --hfe                       | 260   | Q1  | betaForward                          | 260
            low-side-npn                           | --hfe-min                   | 120   | Q1  | hfeMin                               | 120
            low-side-nmos                          | --base-resistor             | 220   | R1  | resistanceOhms                       | 220
            low-side-nmos                          | --pull-down                 | 47k   | R2  | resistanceOhms                       | 47000
            low-side-nmos                          | --vth                       | 1.05  | Q1  | thresholdVolts                       | 1.05
            low-side-nmos                          | --kp                        | 0.4   | Q1  | transconductanceAmpsPerVoltSquared   | 0.4
            low-side-nmos                          | --lambda                    | 20m   | Q1  | lambdaPerVolt                        | 0.02
            darlington-channel                     | --base-resistor             | 47    | R1  | resistanceOhms                       | 47
            darlington-channel                     | --hfe                       | 110   | U2  | betaForward                          | 110
            darlington-channel                     | --hfe-min                   | 800   | U2  | hfeMin                               | 800
            high-side-pnp                          | --base-resistor             | 2k7   | R4  | resistanceOhms                       | 2700
            high-side-pnp                          | --pull-down                 | 56k   | R2  | resistanceOhms                       | 56000
            high-side-pnp                          | --pull-up                   | 15k   | R3  | resistanceOhms                       | 15000
            high-side-pnp                          | --shift-resistor            | 10k   | R1  | resistanceOhms                       | 10000
            high-side-pnp                          | --hfe                       | 230   | Q1  | betaForward                          | 230
            high-side-pnp --drive direct           | --base-resistor             | 3k3   | R1  | resistanceOhms                       | 3300
            high-side-pnp --drive direct           | --pull-up                   | 12k   | R2  | resistanceOhms                       | 12000
            low-side-npn --suppressor diode-zener  | --zener-voltage             | 15    | D2  | breakdownVolts                       | 15
            low-side-npn --suppressor tvs          | --zener-voltage             | 33    | D1  | breakdownVolts                       | 33
            darlington-channel --suppressor diode-zener | --zener-voltage        | 18    | D2  | breakdownVolts                       | 18
            low-side-npn --suppressor rc           | --suppressor-resistance     | 390   | R5  | resistanceOhms                       | 390
            low-side-npn --suppressor rc           | --snubber-capacitance       | 220n  | C1  | capacitanceFarads                    | 220e-9
            high-side-pnp --suppressor resistor    | --suppressor-resistance     | 1k    | R5  | resistanceOhms                       | 1000
            low-side-npn                           | --max-coil-voltage          | 150   | K1  | maxCoilVoltagePercent                | 150
            low-side-npn                           | --contact-supply-tolerance  | 5     | V2  | tolerancePercent                     | 5
            low-side-npn                           | --load-resistance           | 96    | E1  | resistanceOhms                       | 96
            low-side-npn                           | --load-inrush               | 12    | E1  | inrushMultiple                       | 12
            low-side-npn                           | --load-inrush-time          | 20m   | E1  | inrushSeconds                        | 0.02
            low-side-npn                           | --load-power-factor         | 0.35  | E1  | powerFactor                          | 0.35
            low-side-npn                           | --load-inductance           | 800m  | E1  | inductanceHenries                    | 0.8
            low-side-npn                           | --contact-rating-ac-current | 16    | K1  | contactRatedAmps                     | 16
            low-side-npn                           | --contact-rating-ac-voltage | 277   | K1  | contactRatedVolts                    | 277
            low-side-npn                           | --contact-rating-dc-current | 8     | K1  | contactRatedDcAmps                   | 8
            low-side-npn                           | --contact-rating-dc-voltage | 48    | K1  | contactRatedDcVolts                  | 48
            low-side-npn                           | --contact-make-current      | 80    | K1  | contactMakeAmps                      | 80
            """)
    @DisplayName("each value option sets its part's parameter, in SI, and nothing else")
    void valueOption(String variant, String option, String text, String ref, String key, double expected) {
        Path file = dir.resolve("s.stage.json");
        List<String> args = new ArrayList<>(List.of("new"));
        args.addAll(Arrays.asList(variant.split("\\s+")));
        args.addAll(List.of(option, text, "-o", file.toString()));
        CliRun r = CliRun.of(args.toArray(String[]::new));
        assertEquals(0, r.status(), r.err());
        Stage written = StageFiles.open(file).first();
        assertEquals(expected, written.require(ref).value(key), Math.abs(expected) * 1e-15);
        Stage base = StageFiles.open(writeBare(variant)).first();
        assertEquals(base.withPart(base.require(ref).with(key, written.require(ref).value(key))), written,
                "only " + ref + "." + key + " changed");
    }

    private Path writeBare(String variant) {
        Path bare = dir.resolve("bare.stage.json");
        CliRun r = newStage(variant + " --force", bare);
        assertEquals(0, r.status(), r.err());
        return bare;
    }

    @Test
    @DisplayName("--suppressor, --drive, --pin-state, --ambient and --name shape the stage")
    void variantsAndConditions() {
        Path file = dir.resolve("v.stage.json");
        CliRun r = newStage("high-side-pnp --suppressor tvs --drive direct --pin-state low --ambient 40 "
                + "--name Interlock", file);
        assertEquals(0, r.status(), r.err());
        Stage expected = Templates.build(StageTemplate.HIGH_SIDE_PNP, Suppressor.TVS, HighSideDrive.DIRECT);
        expected = expected.withConditions(expected.conditions().withPinHigh(false).withAmbient(40))
                .withName("Interlock");
        assertEquals(StageDocument.of(expected), StageFiles.open(file));
        assertTrue(r.out().contains("\"Interlock\""), r.out());
    }

    @Test
    @DisplayName("several options at once, as in the help example")
    void severalOptions() {
        Path file = dir.resolve("valve.stage.json");
        CliRun r = newStage("low-side-npn --supply 24 --coil-resistance 1k5 --base-resistor 1k8", file);
        assertEquals(0, r.status(), r.err());
        Stage s = StageFiles.open(file).first();
        assertEquals(24, s.require("V1").value("volts"), 0);
        assertEquals(1500, s.require("K1").value("coilResistanceOhms"), 0);
        assertEquals(1800, s.require("R1").value("resistanceOhms"), 0);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            # arguments after 'new'                            | status | stable fragment of the sentence
            low-side-npn --supply abc                          | 2      | Cannot read "abc" as a voltage
            low-side-npn --supply 5mA                          | 2      | not of voltage
            low-side-npn --base-resistor -5                    | 2      | cannot be negative
            low-side-npn --hfe many                            | 2      | Invalid value for option '--hfe'
            triac                                              | 2      | "triac" is not a template; choose low-side-npn
            low-side-npn --suppressor varistor                 | 2      | "varistor" is not a suppressor
            low-side-npn --pin-state on                        | 2      | "on" is not a pin state; choose high or low
            low-side-npn --drive direct                        | 2      | --drive applies only to the high-side-pnp template
            low-side-npn --vth 1                               | 2      | --vth does not apply to low-side-npn with suppressor diode: its Q1 (NPN transistor) has no parameter thresholdVolts
            low-side-nmos --hfe 200                            | 2      | --hfe does not apply
            darlington-channel --pull-down 10k                 | 2      | it has no pull-down resistor
            high-side-pnp --drive direct --shift-resistor 10k  | 2      | it has no level-shift base resistor
            low-side-npn --pull-up 10k                         | 2      | --pull-up does not apply
            low-side-npn --zener-voltage 15                    | 2      | it has no zener or TVS in its suppressor
            low-side-npn --suppressor diode-zener --suppressor-resistance 1k | 2 | it has no resistor in its suppressor
            low-side-nmos --snubber-capacitance 100n           | 2      | it has no snubber capacitor
            low-side-npn --coil-resistance 5M                  | 2      | expected a value from
            low-side-npn --must-release 10                     | 2      | must be below its must-operate voltage
            low-side-npn --frequency 5                         | 2      | Unknown options: '--frequency'
            low-side-npn --supply -24                          | 2      | --supply must be a positive coil rail
            low-side-npn --ambient -250                        | 2      | expected a value from -60 °C to 200 °C
            """)
    @DisplayName("bad input: one sentence on stderr, exit status 2, no file, no stack trace")
    void usageErrors(String args, int status, String fragment) {
        Path file = dir.resolve("x.stage.json");
        CliRun r = newStage(args, file);
        assertEquals(status, r.status(), r.err());
        assertTrue(r.err().contains(fragment), r.err());
        assertTrue(r.err().startsWith("armature new: "), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertEquals("", r.out());
        assertTrue(r.noStackTrace(), r.err());
        assertFalse(Files.exists(file));
    }

    @Test
    @DisplayName("a missing -o is a usage error")
    void missingOutput() {
        CliRun r = CliRun.of("new", "low-side-npn");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("Missing required option: '--output=FILE'"), r.err());
    }

    @Test
    @DisplayName("an existing file is kept unless --force is given (status 1, then 0)")
    void existingFile() throws IOException {
        Path file = dir.resolve("k.stage.json");
        Files.writeString(file, "keep me");
        CliRun r = newStage("low-side-npn", file);
        assertEquals(1, r.status());
        assertTrue(r.err().contains("already exists; add --force to replace it."), r.err());
        assertEquals("keep me", Files.readString(file));
        CliRun forced = newStage("low-side-npn --force", file);
        assertEquals(0, forced.status(), forced.err());
        assertEquals(StageDocument.of(Templates.build(StageTemplate.LOW_SIDE_NPN)), StageFiles.open(file));
    }

    @Test
    @DisplayName("an unwritable file is a failure: status 1 and the reason")
    void unwritable() {
        Path file = dir.resolve("missing-folder").resolve("u.stage.json");
        CliRun r = newStage("low-side-npn", file);
        assertEquals(1, r.status());
        assertTrue(r.err().startsWith("armature new: Cannot write "), r.err());
        assertTrue(r.err().contains("does not exist"), r.err());
        assertTrue(r.noStackTrace(), r.err());
    }

    @Test
    @DisplayName("a warning from the validator is printed but the file is written")
    void warningsAreShown() {
        Path file = dir.resolve("w.stage.json");
        CliRun r = newStage("low-side-npn --must-operate 13", file);
        assertEquals(0, r.status(), r.err());
        assertTrue(r.err().startsWith("warning: K1 must-operate voltage (13.0 V) is above the rated coil voltage"),
                r.err());
        assertTrue(Files.exists(file));
    }

    @Test
    @DisplayName("reproduction: a 230 V AC contact rail keeps the lamp's 12 W true (230² / 12 = 4,408 Ω, derived), not 48 Ω drawing 4.79 A")
    void contactRailKeepsLoadPower() {
        Path file = dir.resolve("m.stage.json");
        CliRun r = newStage("low-side-npn --contact-supply 230 --contact-waveform ac", file);
        assertEquals(0, r.status(), r.err());
        Stage s = StageFiles.open(file).first();
        assertEquals("ac-rms", s.require("V2").option("waveform"));
        assertEquals(230.0 * 230 / 12, s.require("E1").value("resistanceOhms"), 1e-9);
        assertFalse(org.armature.analysis.StageChecks.run(s).findings().stream()
                .anyMatch(f -> f.key().equals("contact.load-power-mismatch")));
    }

    @Test
    @DisplayName("load kind, power, insulation class and contact protection: a 24 V, 12 W DC solenoid with the rule-of-thumb RC")
    void contactSideWords() {
        Path file = dir.resolve("v.stage.json");
        CliRun r = newStage("low-side-npn --load solenoid --load-power 12 --insulation-class F --contact-protection rc", file);
        assertEquals(0, r.status(), r.err());
        Stage s = StageFiles.open(file).first();
        assertEquals("solenoid", s.require("E1").option("loadKind"));
        assertEquals(24.0 * 24 / 12, s.require("E1").value("resistanceOhms"), 1e-9);   // 48 Ω (derived)
        assertEquals(155, s.require("K1").value("insulationClassCelsius"), 0);          // class F, IEC 60085
        assertEquals(12, s.require("R5").value("resistanceOhms"), 1e-9);     // 0.5 Ω/V × 26.4 V → E12 (CT-7)
        assertEquals(680e-9, s.require("C2").value("capacitanceFarads"), 1e-15); // 1 µF/A × 0.55 A → E6 up
        var br = org.armature.analysis.StageChecks.run(s).check("contact.break").orElseThrow();
        assertTrue(br.explanation().contains("with RC across the contacts (R5, C2)"), br.explanation());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
            low-side-npn --contact-waveform ac --contact-protection diode | diode applies only to a DC contact rail
            low-side-npn --varistor-voltage 100                           | need --contact-protection rc or varistor
            low-side-npn --load heater                                     | "heater" is not a load kind
            low-side-npn --insulation-class Q                              | "Q" is not a thermal class
            """)
    @DisplayName("contact-side usage errors are one sentence with status 2")
    void contactUsageErrors(String args, String fragment) {
        Path file = dir.resolve("y.stage.json");
        CliRun r = newStage(args, file);
        assertEquals(2, r.status(), r.err());
        assertTrue(r.err().contains(fragment), r.err());
        assertTrue(r.noStackTrace(), r.err());
        assertFalse(Files.exists(file));
    }

    @Test
    @DisplayName("new --help documents every value option")
    void helpListsEveryOption() {
        CliRun r = CliRun.of("new", "--help");
        assertEquals(0, r.status());
        Stream.concat(Arrays.stream(StageValue.values()).map(StageValue::optionName),
                        Stream.of("--suppressor", "--drive", "--pin-state", "--ambient", "--output", "--force",
                                "--contact-waveform", "--load", "--insulation-class", "--contact-protection",
                                "--protection-resistance", "--protection-capacitance", "--varistor-voltage"))
                .forEach(o -> assertTrue(r.out().contains(o), o));
    }
}
