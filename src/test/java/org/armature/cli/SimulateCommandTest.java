package org.armature.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.armature.io.StageFiles;
import org.armature.model.HighSideDrive;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code armature simulate}, run in process on a template stage. */
class SimulateCommandTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    private Path file;

    @BeforeEach
    void writeStage() {
        file = dir.resolve("npn.stage.json");
        StageFiles.save(new StageDocument("npn", List.of(
                Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT))), file);
    }

    @Test
    @DisplayName("--json prints one object with the ten metrics (armature speed at break added), the events and the sample count")
    void jsonShape() throws Exception {
        CliRun r = CliRun.of("simulate", file.toString(), "--json");
        assertEquals(0, r.status(), r.err());
        assertEquals("", r.err());
        JsonNode j = JSON.readTree(r.out());
        JsonNode m = j.get("metrics");
        assertEquals(List.of("peakSwitchVoltage", "peakCoilReverseVoltage", "decayToDropOutCurrent", "decayToZero",
                "releaseTime", "operateTime", "suppressorEnergy", "switchEnergy", "switchBreakdown", "armatureSpeedAtBreak"),
                iterate(m));
        // 12 V rail plus a rectifier's forward drop at ~30 mA (check-values.md: switch peak = Vsupply + Vc)
        assertEquals(12.8, m.get("peakSwitchVoltage").asDouble(), 0.3);
        assertTrue(m.get("operateTime").isNull(), "no turn-on edge in an off run");
        assertEquals(false, m.get("switchBreakdown").asBoolean());
        assertEquals("drive low", j.get("events").get(0).get("what").asText());
        assertEquals(0.001, j.get("events").get(0).get("time").asDouble(), 1e-12);
        assertTrue(j.get("samples").asInt() > 10);
    }

    @Test
    @DisplayName("--edge on --duration 30m: operate time reported, release null")
    void turnOn() throws Exception {
        CliRun r = CliRun.of("simulate", file.toString(), "--edge", "on", "--duration", "30m", "--json");
        assertEquals(0, r.status(), r.err());
        JsonNode m = JSON.readTree(r.out()).get("metrics");
        assertTrue(m.get("operateTime").asDouble() > 0);
        assertTrue(m.get("releaseTime").isNull());
    }

    @Test
    @DisplayName("--csv writes a header with units and one row per sample")
    void csv() throws Exception {
        Path out = dir.resolve("edge.csv");
        CliRun r = CliRun.of("simulate", file.toString(), "--edge", "pulse", "--csv", out.toString(), "--json");
        assertEquals(0, r.status(), r.err());
        List<String> lines = Files.readAllLines(out);
        String header = lines.get(0);
        assertTrue(header.startsWith("time [s],V("), header);
        assertTrue(header.contains("coil current [A]") && header.contains("armature position [m]"), header);
        assertEquals(JSON.readTree(r.out()).get("samples").asInt(), lines.size() - 1);
    }

    @Test
    @DisplayName("an unknown edge is a usage error (status 2) in one sentence")
    void badEdge() {
        CliRun r = CliRun.of("simulate", file.toString(), "--edge", "sideways");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("sideways"), r.err());
        assertTrue(r.noStackTrace());
    }

    private static List<String> iterate(JsonNode n) {
        List<String> names = new java.util.ArrayList<>();
        n.fieldNames().forEachRemaining(names::add);
        return names;
    }

    @Test
    @DisplayName("a relay the armature fit rejects runs with constant inductance, and the summary says so")
    void rejectedArmatureFitIsNoted() {
        org.armature.model.Stage st = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE,
                HighSideDrive.LEVEL_SHIFT);
        org.armature.model.Part k1 = st.part("K1").orElseThrow();
        // 1.2 H released, 20 H attracted: more than √ρ·Ipu/Ido (≈ 10.6 for 9 V / 1.2 V, ρ = 2) times
        // the released inductance, which the flux-state fit cannot reach (derived, RelayArmatureFit)
        Path bad = dir.resolve("bad.stage.json");
        StageFiles.save(new StageDocument("bad", List.of(st.withPart(k1.with("inductanceAttractedHenries", 20)))), bad);
        CliRun r = CliRun.of("simulate", bad.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("note: K1: no moving armature, constant inductance instead"), r.out());
    }
}
