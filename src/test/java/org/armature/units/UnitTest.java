package org.armature.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

class UnitTest {

    @Test
    @DisplayName("No spelling belongs to two units, so a unit mismatch is never ambiguous")
    void spellingsAreUnique() {
        Map<String, Unit> owner = new HashMap<>();
        for (Unit unit : Unit.values()) {
            for (String spelling : unit.spellings()) {
                Unit previous = owner.put(spelling, unit);
                assertEquals(null, previous, spelling + " is used by " + previous + " and " + unit);
            }
        }
    }

    @ParameterizedTest
    @EnumSource(Unit.class)
    @DisplayName("Every example in a unit's messages reads back as that unit")
    void examplesParse(Unit unit) {
        for (String example : unit.examples().split(", | or ")) {
            assertTrue(EngineeringNotation.tryParse(example, unit).isValid(), unit + ": " + example);
        }
    }

    @ParameterizedTest
    @EnumSource(Unit.class)
    @DisplayName("The symbol comes first among the spellings and reads back")
    void symbolFirst(Unit unit) {
        if (unit.symbol().isEmpty()) {
            assertTrue(unit.spellings().isEmpty());
        } else {
            assertEquals(unit.symbol(), unit.spellings().get(0));
            assertEquals(2.0, EngineeringNotation.parse("2 " + unit.symbol(), unit), 0.0);
        }
        assertThrows(UnsupportedOperationException.class, () -> unit.spellings().add("x"));
    }

    @Test
    @DisplayName("Quantity names take the right article")
    void articles() {
        assertEquals("a resistance", Unit.OHM.quantityWithArticle());
        assertEquals("an inductance", Unit.HENRY.quantityWithArticle());
        assertEquals("an energy", Unit.JOULE.quantityWithArticle());
    }
}
