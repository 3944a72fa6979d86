package org.armature.netlist;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.armature.model.Part;

/**
 * The elements one part of the drawing became, with the nodes of its pins and how to read its
 * quantities back from a solution.
 *
 * <p>Quantity keys by kind (the CLI prints them as JSON):
 * <ul>
 * <li>resistor, load: {@code current} (a→b), {@code voltage}, {@code power};</li>
 * <li>diode, zener, LED, TVS: {@code current} (anode→cathode, terminal 1→2 for a TVS),
 *     {@code voltage}, {@code power};</li>
 * <li>capacitor: {@code current} (0 at DC), {@code voltage}, {@code power};</li>
 * <li>supply: {@code current} (sourced out of the rail), {@code volts}, {@code deliveredPower};</li>
 * <li>drive pin: {@code current} (positive = sourced out of the pin), {@code volts},
 *     {@code deliveredPower};</li>
 * <li>NPN, PNP: {@code ic}, {@code ib}, {@code vce}, {@code vbe}, {@code forcedBeta}, {@code power};
 *     state {@code region} = {@code cutoff|active|saturation}. For a PNP the values are in its own
 *     polarity (ic out of the collector, vce = VE − VC), so a conducting transistor reads positive;</li>
 * <li>NMOS: {@code id} (into the drain, body diode included), {@code vgs}, {@code vds},
 *     {@code power}; state {@code region} = {@code cutoff|triode|saturation};</li>
 * <li>Darlington channel: {@code ic} (into the output), {@code iin}, {@code vce}, {@code vin},
 *     {@code power}; state {@code region} = {@code cutoff|active|saturation};</li>
 * <li>relay: {@code coilCurrent} (A1→A2), {@code coilVoltage}, {@code coilResistance},
 *     {@code coilTemperature} (°C), {@code pickUpCurrent}, {@code dropOutCurrent}, {@code power};
 *     states {@code state} = {@code operated|released|either} (from the coil current) and
 *     {@code contacts} = {@code operated|released} (what the contacts were solved with).</li>
 * </ul>
 */
public final class PartNetwork {

    /** Reads a part's quantities from a solution. */
    @FunctionalInterface
    public interface Reader {
        /**
         * @param x the solution
         * @return the part's reading
         */
        PartReading read(Solution x);
    }

    private final Part part;
    private final Map<String, Integer> pinNodes;
    private final List<Element> elements;
    private final Reader reader;
    private final RelayHandle relay;
    private final int firstElement;
    private final int firstBranch;
    private final int branchCount;
    private final int firstState;
    private final int stateCount;

    /**
     * @param part the part of the drawing
     * @param pinNodes node of each pin, in the kind's pin order
     * @param elements the elements it became
     * @param reader how to read it back
     * @param relay the relay handle, or {@code null} for a part that is not a relay
     * @param firstElement index of its first element in the netlist's element list
     * @param firstBranch its first branch number (its branches are consecutive)
     * @param branchCount how many branches it allocated
     * @param firstState its first state slot (its slots are consecutive)
     * @param stateCount how many state slots it allocated
     */
    PartNetwork(Part part, Map<String, Integer> pinNodes, List<Element> elements, Reader reader, RelayHandle relay,
                int firstElement, int firstBranch, int branchCount, int firstState, int stateCount) {
        this.part = part;
        this.pinNodes = Collections.unmodifiableMap(new LinkedHashMap<>(pinNodes));
        this.elements = List.copyOf(elements);
        this.reader = reader;
        this.relay = relay;
        this.firstElement = firstElement;
        this.firstBranch = firstBranch;
        this.branchCount = branchCount;
        this.firstState = firstState;
        this.stateCount = stateCount;
    }

    int firstElement() {
        return firstElement;
    }

    int firstBranch() {
        return firstBranch;
    }

    int branchCount() {
        return branchCount;
    }

    int firstState() {
        return firstState;
    }

    int stateCount() {
        return stateCount;
    }

    /** @return the part as drawn */
    public Part part() {
        return part;
    }

    /** @return the designator */
    public String ref() {
        return part.ref();
    }

    /** @return node of each pin, by pin name, in the kind's pin order */
    public Map<String, Integer> pinNodes() {
        return pinNodes;
    }

    /** @return the elements this part became */
    public List<Element> elements() {
        return elements;
    }

    /** @return the relay handle when this part is a relay */
    public Optional<RelayHandle> relay() {
        return Optional.ofNullable(relay);
    }

    /**
     * Reads the part at a solution. Thread-safe: reading never touches the Newton loop's state.
     *
     * @param x the solution
     * @return quantities, states, pin currents and absorbed power
     */
    public PartReading read(Solution x) {
        return reader.read(x);
    }
}
