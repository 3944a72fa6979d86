package org.armature.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;
import org.armature.io.StageFiles;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code armature check} and {@code armature size}, run in process. */
class CheckCommandTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    private Path file;

    @BeforeEach
    void writeStage() {
        file = dir.resolve("valve.stage.json");
        StageFiles.save(StageDocument.of(Templates.build(StageTemplate.DARLINGTON_CHANNEL)), file);
    }

    @Test
    @DisplayName("check --json: one object with checks (id, status, value, limit, unit, corner, explanation) and yield")
    void checkJson() throws Exception {
        CliRun r = CliRun.of("check", file.toString(), "--json", "--no-transient", "--monte-carlo", "20", "--seed", "3");
        assertEquals(0, r.status(), r.err());
        JsonNode j = JSON.readTree(r.out());
        Set<String> ids = new HashSet<>();
        for (JsonNode c : j.get("checks")) {
            ids.add(c.get("id").asText());
            assertTrue(Set.of("pass", "warn", "fail").contains(c.get("status").asText()));
            assertTrue(c.has("value") && c.has("limit") && c.has("unit") && c.has("corner") && c.has("explanation"));
        }
        assertTrue(ids.containsAll(Set.of("relay.operates", "relay.releases", "switch.saturated",
                "rating.switch-voltage", "thermal.switch-junction")), ids.toString());
        assertTrue(j.get("yield").asDouble() >= 0 && j.get("yield").asDouble() <= 1);
        assertEquals(20, j.get("monteCarlo").get("samples").asInt());
        assertEquals(3, j.get("monteCarlo").get("seed").asLong());
    }

    @Test
    @DisplayName("check on the same stage with other designators, moved, turned and without test points: the same"
            + " verdicts and values, with the parts under their own designators")
    void checkAnyDesignators() throws Exception {
        org.armature.model.Stage template = Templates.build(StageTemplate.LOW_SIDE_NPN);
        org.armature.model.StageDisguise x = org.armature.model.StageDisguise.of(template, 17, 5, -7, false, 2, false);
        Path other = dir.resolve("drawn.stage.json");
        StageFiles.save(StageDocument.of(template), file);
        StageFiles.save(StageDocument.of(x.stage()), other);
        JsonNode a = JSON.readTree(CliRun.of("check", file.toString(), "--json", "--no-transient").out());
        JsonNode b = JSON.readTree(CliRun.of("check", other.toString(), "--json", "--no-transient").out());
        assertEquals(a.get("checks").size(), b.get("checks").size());
        assertTrue(a.get("checks").size() >= 5, a.toString());
        for (int i = 0; i < a.get("checks").size(); i++) {
            JsonNode ca = a.get("checks").get(i);
            JsonNode cb = b.get("checks").get(i);
            assertEquals(ca.get("id").asText(), cb.get("id").asText());
            assertEquals(ca.get("status").asText(), cb.get("status").asText(), ca.get("id").asText());
            if (ca.get("value").isNumber()) {
                // the same circuit numbered differently: equal to 1e-6 relative (derived)
                assertEquals(ca.get("value").asDouble(), cb.get("value").asDouble(),
                        1e-6 * Math.max(1e-9, Math.abs(ca.get("value").asDouble())), ca.get("id").asText());
            }
            for (JsonNode ref : ca.get("refs")) {
                boolean found = false;
                for (JsonNode r2 : cb.get("refs")) {
                    found |= r2.asText().equals(x.ref(ref.asText()));
                }
                assertTrue(found, ca.get("id").asText() + " names " + x.ref(ref.asText()));
            }
        }
    }

    @Test
    @DisplayName("check --json reports the coil and contact ids, contact.break for an inductive load")
    void contactIdsInJson() throws Exception {
        Path sol = dir.resolve("sol.stage.json");
        assertEquals(0, CliRun.of("new", "low-side-npn", "--load", "solenoid", "--contact-protection", "diode",
                "-o", sol.toString()).status());
        CliRun r = CliRun.of("check", sol.toString(), "--json", "--no-transient");
        assertEquals(0, r.status(), r.err());
        Set<String> ids = new HashSet<>();
        for (JsonNode c : JSON.readTree(r.out()).get("checks")) {
            ids.add(c.get("id").asText());
        }
        assertTrue(ids.containsAll(Set.of("coil.voltage", "coil.temperature", "contact.current", "contact.voltage",
                "contact.inrush", "contact.break")), ids.toString());
    }

    @Test
    @DisplayName("check: --supply-tolerance and the ambient range reach the corners")
    void overrides() throws Exception {
        CliRun r = CliRun.of("check", file.toString(), "--json", "--no-transient", "--supply-tolerance", "5",
                "--ambient-min", "0", "--ambient-max", "40");
        assertEquals(0, r.status(), r.err());
        JsonNode operates = null;
        for (JsonNode c : JSON.readTree(r.out()).get("checks")) {
            if (c.get("id").asText().equals("relay.operates")) {
                operates = c;
            }
        }
        assertEquals(12 * 0.95, operates.get("corner").get("supply").asDouble(), 1e-9);   // 12 V −5 %
        assertEquals(40, operates.get("corner").get("ambient").asDouble(), 1e-9);
        assertTrue(JSON.readTree(r.out()).get("yield").isNull());
    }

    @Test
    @DisplayName("check: readable report says which checks ran and never calls the design safe")
    void checkText() {
        CliRun r = CliRun.of("check", file.toString(), "--no-transient");
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("relay.operates"));
        assertTrue(r.out().contains("do not show that the design is safe"));
    }

    @Test
    @DisplayName("check: usage errors are one sentence, status 2")
    void usage() {
        CliRun r = CliRun.of("check", file.toString(), "--ambient-min", "50", "--ambient-max", "10");
        assertEquals(2, r.status());
        assertTrue(r.noStackTrace(), r.err());
    }

    @Test
    @DisplayName("size --json: suggestions and steps; E12 and forced β 20 are honoured")
    void sizeJson() throws Exception {
        Path npn = dir.resolve("npn.stage.json");
        StageFiles.save(StageDocument.of(Templates.build(StageTemplate.LOW_SIDE_NPN)), npn);
        CliRun r = CliRun.of("size", npn.toString(), "--json", "--series", "E12", "--forced-beta", "20");
        assertEquals(0, r.status(), r.err());
        JsonNode j = JSON.readTree(r.out());
        assertEquals("low-side-npn", j.get("topology").asText(), "the id the new command takes (was LOW_SIDE_NPN)");
        assertEquals("E12", j.get("series").asText());
        JsonNode rb = null;
        for (JsonNode s : j.get("suggestions")) {
            if (s.get("role").asText().equals("base resistor")) {
                rb = s;
            }
        }
        assertEquals("R1", rb.get("ref").asText());
        assertEquals(10, rb.get("tolerancePercent").asDouble(), 1e-12);      // E12 is ±10 % (PV-7)
        assertTrue(j.get("steps").size() > 10);
        boolean forced = false;
        for (JsonNode s : j.get("steps")) {
            forced |= s.get("formula").asText().contains("βforced = 20");
        }
        assertTrue(forced);
    }

    @Test
    @DisplayName("size: readable calculation; an unknown series is a usage error")
    void sizeText() {
        CliRun r = CliRun.of("size", file.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("input current available"));
        CliRun bad = CliRun.of("size", file.toString(), "--series", "E7");
        assertEquals(2, bad.status());
        assertTrue(bad.noStackTrace(), bad.err());
    }

    @Test
    @DisplayName("--ambient-max outside the models' range is refused with the valid range")
    void ambientMaxOutsideTheModels() {
        CliRun r = CliRun.of("check", file.toString(), "--no-transient", "--ambient-max", "300");
        assertEquals(2, r.status(), r.err());
        assertTrue(r.err().contains("--ambient-max must lie from -60 °C to 200 °C"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
    }
}
