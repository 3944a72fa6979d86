package org.armature.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Placement;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The coil figures the checks use, through the devices' copper law. */
class PartPhysicsTest {

    private static Part relay(double ohms, double refCelsius) {
        return Part.of("K1", PartKind.RELAY, Placement.at(0, 0)).with("coilResistanceOhms", ohms)
                .with("referenceTemperatureCelsius", refCelsius);
    }

    @Test
    @DisplayName("RC-6 (relay maker's temperature note; derived): 320 Ω at 25 °C is 443.3 Ω at 125 °C")
    void rc6() {
        assertEquals(443.3, PartPhysics.coilOhms(relay(320, 25), 1, 125), 0.05);
    }

    @Test
    @DisplayName("RC-7 (same note): pick-up 13.0 V at 25 °C rises to 18.0 V at 125 °C")
    void rc7() {
        assertEquals(18.0, PartPhysics.coilVoltsAt(relay(320, 25), 13.0, 125), 0.05);
    }

    @ParameterizedTest(name = "{0} °C: {1} V")
    @CsvSource(textBlock = """
            85,  19.7
            100, 20.6
            -25, 12.9
            """)
    @DisplayName("RC-9 (relay maker's note on pull-in at temperature): 16 V at 25 °C, α = 0.003853")
    void rc9(double celsius, double volts) {
        assertEquals(volts, PartPhysics.coilVoltsAt(relay(400, 25), 16.0, celsius), 0.05);
    }

    @Test
    @DisplayName("RC-10 (relay maker's temperature note; derived): 360 Ω → 410 Ω from 23 °C is a rise of 35.8 K")
    void rc10() {
        assertEquals(35.8, PartPhysics.coilCelsiusFromOhms(relay(360, 23), 410) - 23, 0.05);
    }

    @Test
    @DisplayName("BJ-13 (derived, XTB form from memory): ×0.6915 at −40 °C, ×1.3166 at 85 °C")
    void bj13() {
        Part q = Part.of("Q1", PartKind.NPN, Placement.at(0, 0));
        assertEquals(0.6915, PartPhysics.gainFactor(q, -40), 1e-4);
        assertEquals(1.3166, PartPhysics.gainFactor(q, 85), 1e-4);
    }
}
