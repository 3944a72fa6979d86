package org.armature.cli;

import java.util.Map;
import org.armature.units.Unit;

/**
 * Plain words for the keys of a part's results ({@link org.armature.netlist.PartNetwork}), for the
 * readable output; {@code --json} keeps the keys. A key without words here is printed as words made
 * from its camel case ({@code coilTemperature} → "coil temperature").
 */
final class PartWords {

    private PartWords() {
    }

    /** Key → label and unit. */
    private record Word(String label, Unit unit) {
    }

    private static final Map<String, Word> QUANTITIES = Map.ofEntries(
            Map.entry("current", new Word("current", Unit.AMPERE)),
            Map.entry("voltage", new Word("voltage", Unit.VOLT)),
            Map.entry("volts", new Word("voltage", Unit.VOLT)),
            Map.entry("power", new Word("power dissipated", Unit.WATT)),
            Map.entry("deliveredPower", new Word("power delivered", Unit.WATT)),
            Map.entry("ib", new Word("base current", Unit.AMPERE)),
            Map.entry("ic", new Word("collector current", Unit.AMPERE)),
            Map.entry("id", new Word("drain current", Unit.AMPERE)),
            Map.entry("iin", new Word("input current", Unit.AMPERE)),
            Map.entry("vbe", new Word("VBE", Unit.VOLT)),
            Map.entry("vce", new Word("VCE", Unit.VOLT)),
            Map.entry("vgs", new Word("VGS", Unit.VOLT)),
            Map.entry("vds", new Word("VDS", Unit.VOLT)),
            Map.entry("vin", new Word("input voltage", Unit.VOLT)),
            Map.entry("forcedBeta", new Word("forced β", Unit.RATIO)),
            Map.entry("coilCurrent", new Word("coil current", Unit.AMPERE)),
            Map.entry("coilVoltage", new Word("coil voltage", Unit.VOLT)),
            Map.entry("coilResistance", new Word("coil resistance", Unit.OHM)),
            Map.entry("coilTemperature", new Word("coil temperature", Unit.CELSIUS)),
            Map.entry("pickUpCurrent", new Word("pick-up current", Unit.AMPERE)),
            Map.entry("dropOutCurrent", new Word("drop-out current", Unit.AMPERE)));

    private static final Map<String, String> STATES = Map.of(
            "region", "region",
            "state", "armature",
            "contacts", "contacts",
            "contactsFrom", "contact state set by");

    private static final Map<String, String> STATE_VALUES = Map.of(
            "coil-current", "the coil current",
            "previous-state", "the previous state (coil current between drop-out and pick-up)",
            "power-up", "power-up (coil current between drop-out and pick-up)");

    /** The words for a quantity key. */
    static String label(String key) {
        Word w = QUANTITIES.get(key);
        return w != null ? w.label() : words(key);
    }

    /** The unit of a quantity key. */
    static Unit unit(String key) {
        Word w = QUANTITIES.get(key);
        return w != null ? w.unit() : SolveCommand.unitOf(key);
    }

    /** The words for a state key and its value: "contact state set by the coil current". */
    static String state(String key, String value) {
        String k = STATES.getOrDefault(key, words(key));
        return k + " " + STATE_VALUES.getOrDefault(value, value.replace('-', ' '));
    }

    /** camelCase → "camel case". */
    static String words(String key) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < key.length(); i++) {
            char c = key.charAt(i);
            if (Character.isUpperCase(c) && i > 0) {
                b.append(' ').append(Character.toLowerCase(c));
            } else {
                b.append(c);
            }
        }
        return b.toString();
    }
}
