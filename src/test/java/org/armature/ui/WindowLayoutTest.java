package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.prefs.BackingStoreException;
import java.util.prefs.Preferences;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class WindowLayoutTest {

    private Preferences node;

    @BeforeEach
    void freshNode() throws BackingStoreException {
        node = RecentFiles.preferences().node("window-layout-test");
        node.clear();
    }

    @AfterEach
    void dropNode() throws BackingStoreException {
        node.removeNode();
    }

    @Test
    @DisplayName("the node is the one RecentFiles uses: armature-test under surefire (pom setting)")
    void sameNodeAsRecentFiles() {
        assertEquals("armature-test", RecentFiles.preferences().name());
    }

    @Test
    @DisplayName("a layout saved and loaded comes back identical (derived: round trip)")
    void roundTrip() {
        WindowLayout l = new WindowLayout(-1200, 40.5, 1440, 900, true, true);
        l.save(node);
        assertEquals(l, WindowLayout.load(node).orElseThrow());
        WindowLayout m = new WindowLayout(10, 20, 1000, 700, false, false);
        m.save(node);
        assertEquals(m, WindowLayout.load(node).orElseThrow());
    }

    @Test
    @DisplayName("nothing stored: no layout (the window keeps its built-in size)")
    void emptyNode() {
        assertTrue(WindowLayout.load(node).isEmpty());
    }

    @Test
    @DisplayName("a tiny or huge stored size is clamped to the minimum and maximum (derived: clamp)")
    void clampedOnLoad() {
        new WindowLayout(0, 0, 120, 90, false, false).save(node);
        WindowLayout l = WindowLayout.load(node).orElseThrow();
        assertEquals(WindowLayout.MIN_WIDTH_PIXELS, l.widthPixels(), 0);
        assertEquals(WindowLayout.MIN_HEIGHT_PIXELS, l.heightPixels(), 0);
        new WindowLayout(0, 0, 1e9, 1e9, false, false).save(node);
        l = WindowLayout.load(node).orElseThrow();
        assertEquals(WindowLayout.MAX_SIZE_PIXELS, l.widthPixels(), 0);
        assertEquals(WindowLayout.MAX_SIZE_PIXELS, l.heightPixels(), 0);
    }

    @Test
    @DisplayName("a corrupt stored number is no layout, not an exception")
    void corruptValue() {
        new WindowLayout(0, 0, 1000, 700, false, false).save(node);
        node.put("window.width", "wide");
        assertTrue(WindowLayout.load(node).isEmpty());
    }

    @Test
    @DisplayName("a non-finite field is refused, naming it")
    void refusesNonFinite() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new WindowLayout(0, 0, Double.NaN, 700, false, false));
        assertTrue(e.getMessage().contains("widthPixels"));
    }
}
