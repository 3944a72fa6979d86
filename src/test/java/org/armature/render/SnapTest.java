package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.armature.model.GridPoint;
import org.armature.model.Stage;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class SnapTest {

    @ParameterizedTest(name = "({0}, {1}) snaps to ({2}, {3})")
    @CsvSource(textBlock = """
            0.4, 0.6, 0, 1
            -0.4, -0.6, 0, -1
            2.5, -2.5, 3, -2
            """)
    @DisplayName("nearest grid point, halves round towards +infinity (derived: floor(x + 0.5))")
    void grid(double x, double y, int gx, int gy) {
        assertEquals(new GridPoint(gx, gy), Snap.toGrid(x, y));
    }

    @Test
    @DisplayName("near a pin the pin wins over the nearer grid point; far away the grid point is used")
    void pinOrGrid() {
        Stage s = Templates.defaultStage();
        assertEquals(new GridPoint(17, 12), Snap.toConnectionOrGrid(s, 17.45, 11.6, 0.6));
        assertEquals(new GridPoint(30, 30), Snap.toConnectionOrGrid(s, 30.2, 29.9, 0.6));
        assertTrue(Snap.connectionNear(s, 30.2, 29.9, 0.6).isEmpty());
    }
}
