package org.armature.devices;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class RelayThresholdsTest {

    // 12 V coil, 275 Ω, must-operate 75 % and must-release 10 % of rated (RC-5, common practice)
    private static final RelayThresholds RELAY = RelayThresholds.fromVolts(9.0, 1.2, 275.0);

    @ParameterizedTest(name = "{0} mA -> {1} (RC-1 terms, IEC 61810-1)")
    @CsvSource(textBlock = """
            43.6, OPERATED
            32.8, OPERATED
            20.0, EITHER
            4.4, EITHER
            4.3, RELEASED
            0.0, RELEASED
            -40.0, OPERATED
            """)
    void classify(double milliamps, ArmaturePosition expected) {
        assertEquals(expected, RELAY.classify(milliamps * 1e-3));
    }

    @Test
    @DisplayName("History decides inside the hysteresis band")
    void hysteresis() {
        assertTrue(RELAY.operatedAfter(true, 20e-3));
        assertFalse(RELAY.operatedAfter(false, 20e-3));
        assertTrue(RELAY.operatedAfter(false, 40e-3));
        assertFalse(RELAY.operatedAfter(true, 1e-3));
    }

    @Test
    void dropOutMustBeBelowPickUp() {
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class,
                () -> new RelayThresholds(10e-3, 20e-3));
        assertTrue(ex.getMessage().contains("dropOutAmps"));
    }
}
