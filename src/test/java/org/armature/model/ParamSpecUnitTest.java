package org.armature.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Map;
import org.armature.units.Unit;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** Every parameter's {@link Unit} agrees with the unit its key names (the project's naming rule, DEVELOPERS.md). */
class ParamSpecUnitTest {

    /** Key endings and the unit each one names. */
    private static final Map<String, Unit> ENDINGS = Map.ofEntries(
            Map.entry("KelvinPerWatt", Unit.KELVIN_PER_WATT), Map.entry("VoltsPerKelvin", Unit.VOLT_PER_KELVIN),
            Map.entry("AmpsPerVoltSquared", Unit.AMPERE_PER_VOLT_SQUARED), Map.entry("PerVolt", Unit.PER_VOLT),
            Map.entry("NewtonSecondsPerMetre", Unit.NEWTON_SECOND_PER_METRE), Map.entry("Ohms", Unit.OHM),
            Map.entry("Volts", Unit.VOLT), Map.entry("volts", Unit.VOLT), Map.entry("Amps", Unit.AMPERE),
            Map.entry("Farads", Unit.FARAD), Map.entry("Henries", Unit.HENRY), Map.entry("Watts", Unit.WATT),
            Map.entry("Percent", Unit.PERCENT), Map.entry("Celsius", Unit.CELSIUS), Map.entry("Seconds", Unit.SECOND),
            Map.entry("Metres", Unit.METRE), Map.entry("Grams", Unit.GRAM), Map.entry("Kelvin", Unit.KELVIN));

    @ParameterizedTest
    @EnumSource(PartKind.class)
    void unitMatchesTheKey(PartKind kind) {
        for (ParamSpec s : kind.params()) {
            Unit expected = ENDINGS.entrySet().stream().filter(e -> s.key().endsWith(e.getKey()))
                    .max((a, b) -> Integer.compare(a.getKey().length(), b.getKey().length()))
                    .map(Map.Entry::getValue).orElse(Unit.RATIO);
            assertEquals(expected, s.unit(), kind + " " + s.key());
            assertEquals(expected.symbol(), s.unitSymbol());
        }
    }
}
