package org.armature.devices;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class ContactLoadTest {

    private static ContactLoad load(LoadKind kind, double ohms, double ratedWatts) {
        return new ContactLoad(kind, ohms, 0, 0, 0, 0, 2700, 0, 1, 2, ratedWatts);
    }

    @Test
    @DisplayName("steady current: V/R; an LED (V − VF)/R (derived)")
    void steady() {
        assertEquals(0.5, load(LoadKind.RESISTIVE, 48, 12).steadyAmps(24), 1e-15);
        assertEquals(22.0 / 2200, load(LoadKind.LED, 2200, 0).steadyAmps(24), 1e-15);
    }

    @Test
    @DisplayName("tungsten law: (2,700 K / 293.15 K)^1.2 = 14.36, inside CT-6's 12–15 (derived; exponent from memory)")
    void tungsten() {
        assertEquals(14.36, ContactLoad.tungstenResistanceRatio(2700, 293.15), 0.005);
        ContactLoad lamp = load(LoadKind.LAMP, 48, 12);
        assertEquals(14.36 * 0.5, lamp.inrushPeakAmps(24, false, 293.15), 0.005);
        // the envelope starts at the peak and settles to the hot current (derived)
        assertEquals(lamp.inrushPeakAmps(24, false, 293.15), lamp.inrushEnvelopeAmps(0, 24, false, 293.15), 1e-12);
        assertEquals(0.5, lamp.inrushEnvelopeAmps(1, 24, false, 293.15), 1e-9);
        // after one time constant (10 ms, typical): 0.5·(1 + 13.36·e^−1) = 2.957 A (derived)
        assertEquals(0.5 * (1 + (14.359 - 1) * Math.exp(-1)), lamp.inrushEnvelopeAmps(0.01, 24, false, 293.15), 1e-3);
    }

    @Test
    @DisplayName("typical multiples (CT-5, common practice): motor ×6, AC solenoid ×10, DC solenoid ×1; crest √2 on AC")
    void typicalMultiples() {
        assertEquals(6, load(LoadKind.MOTOR, 48, 0).inrushMultiple(false, 293.15, 24), 0);
        assertEquals(10, load(LoadKind.SOLENOID, 100, 0).inrushMultiple(true, 293.15, 230), 0);
        assertEquals(1, load(LoadKind.SOLENOID, 48, 0).inrushMultiple(false, 293.15, 24), 0);
        assertEquals(Math.sqrt(2) * 10 * 2.3, load(LoadKind.SOLENOID, 100, 0).inrushPeakAmps(230, true, 293.15), 1e-9);
        ContactLoad own = new ContactLoad(LoadKind.MOTOR, 48, 8, 0, 0, 0, 2700, 0, 1, 2, 0);
        assertEquals(8, own.inrushMultiple(false, 293.15, 24), 0);
    }

    @Test
    @DisplayName("capacitive inrush is the rail's crest over the loop resistance: 24 V / 1 Ω = 24 A; 230 V AC: 325.3 A (derived)")
    void capacitive() {
        ContactLoad c = load(LoadKind.CAPACITIVE, 48, 12);
        assertEquals(24, c.inrushPeakAmps(24, false, 293.15), 1e-9);
        assertEquals(230 * Math.sqrt(2), load(LoadKind.CAPACITIVE, 4408, 12).inrushPeakAmps(230, true, 293.15), 1e-9);
        // decay R_loop·C with C = 2 µF per watt (typical, from memory): 1 Ω × 24 µF = 24 µs
        assertEquals(24e-6, c.inrushSeconds(false, 24), 1e-15);
    }

    @Test
    @DisplayName("at break: DC L/R = 2 ms per watt (DC-13 form) → 1.152 H for 12 W, 48 Ω; AC |Z|·sin φ / 2π·50 (derived)")
    void breakPhysics() {
        assertEquals(1.152, load(LoadKind.SOLENOID, 48, 12).breakInductanceHenries(24, false), 1e-12);
        ContactLoad ac = load(LoadKind.SOLENOID, 100, 0);
        assertEquals(40, ac.breakResistanceOhms(true), 1e-12);                       // cos φ 0.4 (typical)
        assertEquals(100 * Math.sqrt(1 - 0.16) / (2 * Math.PI * 50), ac.breakInductanceHenries(230, true), 1e-12);
        assertEquals(0, load(LoadKind.LAMP, 48, 12).breakInductanceHenries(24, false), 0);
    }

    @Test
    @DisplayName("resistance for a rated power: 230²/12 = 4,408 Ω; motor 230²·0.8/750 = 56.43 Ω; LED 24·22/0.24 = 2.2 kΩ (derived)")
    void resistanceForPower() {
        assertEquals(230.0 * 230 / 12, load(LoadKind.LAMP, 48, 12).resistanceForPower(230, true, 12), 1e-9);
        assertEquals(230.0 * 230 * 0.8 / 750, load(LoadKind.MOTOR, 70, 750).resistanceForPower(230, true, 750), 1e-9);
        assertEquals(2200, load(LoadKind.LED, 1000, 0).resistanceForPower(24, false, 0.24), 1e-9);
        assertThrows(IllegalArgumentException.class, () -> load(LoadKind.LED, 1000, 0).resistanceForPower(1.5, false, 1));
    }

    @Test
    @DisplayName("load kinds read their identifiers; an unknown one names the allowed ones")
    void kinds() {
        assertEquals(LoadKind.SOLENOID, LoadKind.of("solenoid"));
        assertEquals("DC-13", LoadKind.SOLENOID.category(false));
        assertEquals("AC-15", LoadKind.SOLENOID.category(true));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> LoadKind.of("heater"));
        assertEquals("load kind must be one of resistive, lamp, motor, solenoid, capacitive, led, not 'heater'", e.getMessage());
    }
}
