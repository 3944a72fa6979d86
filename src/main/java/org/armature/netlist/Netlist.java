package org.armature.netlist;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A flattened circuit ready for modified nodal analysis: nodes, branches, state slots and elements,
 * and the part networks they came from.
 *
 * <p>Unknown vector layout: node voltages {@code 0..nodeCount-1}, then branch currents
 * {@code nodeCount..nodeCount+branchCount-1}. The structure is immutable; nonlinear elements keep
 * Newton limiting memory, so a netlist serves one solve at a time.
 */
public final class Netlist {

    /** Node index of the reference (ground) node. */
    public static final int GROUND = -1;

    private final List<String> nodeNames;
    private final List<String> branchNames;
    private final double[] initialStates;
    private final List<Element> elements;
    private final List<PartNetwork> parts;
    private final Map<String, Integer> netNodes;
    private final Map<String, Integer> nodeIndex;
    /** Part network index by designator (the same for every netlist of one numbering). */
    private final Map<String, Integer> partIndex;

    Netlist(List<String> nodeNames, List<String> branchNames, double[] initialStates, List<Element> elements,
            List<PartNetwork> parts, Map<String, Integer> netNodes) {
        this.nodeNames = List.copyOf(nodeNames);
        this.branchNames = List.copyOf(branchNames);
        this.initialStates = initialStates.clone();
        this.elements = List.copyOf(elements);
        this.parts = List.copyOf(parts);
        this.netNodes = Collections.unmodifiableMap(new LinkedHashMap<>(netNodes));
        Map<String, Integer> index = new HashMap<>();
        for (int i = 0; i < this.nodeNames.size(); i++) {
            index.put(this.nodeNames.get(i), i);
        }
        this.nodeIndex = Collections.unmodifiableMap(index);
        Map<String, Integer> byRef = new HashMap<>();
        for (int i = 0; i < this.parts.size(); i++) {
            byRef.putIfAbsent(this.parts.get(i).ref(), i);
        }
        this.partIndex = Collections.unmodifiableMap(byRef);
    }

    /** A netlist of the same shape as {@code base} with other elements and parts (no copies of the shape). */
    private Netlist(Netlist base, double[] initialStates, Element[] elements, PartNetwork[] parts) {
        this.nodeNames = base.nodeNames;
        this.branchNames = base.branchNames;
        this.netNodes = base.netNodes;
        this.nodeIndex = base.nodeIndex;
        this.partIndex = base.partIndex;
        this.initialStates = initialStates;
        this.elements = Collections.unmodifiableList(Arrays.asList(elements));
        this.parts = Collections.unmodifiableList(Arrays.asList(parts));
    }

    /**
     * The same netlist with some part networks replaced by networks of identical structure.
     *
     * @param replacements new part networks by part index ({@code null} = keep)
     * @param states initial state slots of the result (taken, not copied)
     */
    Netlist withParts(PartNetwork[] replacements, double[] states) {
        Element[] els = elements.toArray(new Element[0]);
        PartNetwork[] ps = parts.toArray(new PartNetwork[0]);
        for (int i = 0; i < replacements.length; i++) {
            PartNetwork r = replacements[i];
            if (r == null) {
                continue;
            }
            ps[i] = r;
            List<Element> re = r.elements();
            for (int k = 0; k < re.size(); k++) {
                els[r.firstElement() + k] = re.get(k);
            }
        }
        return new Netlist(this, states, els, ps);
    }

    /**
     * @param other another netlist
     * @return true if both have the same unknowns: the same node names in the same order and the
     *     same branches (so a solution vector of one is a start point of the other)
     */
    public boolean sameShape(Netlist other) {
        return other == this || (other.nodeNames == nodeNames || other.nodeNames.equals(nodeNames))
                && (other.branchNames == branchNames || other.branchNames.equals(branchNames));
    }

    /**
     * @param name a node name (a net or an internal node such as {@code Q1.b'})
     * @return its index, or {@link #GROUND} for {@code gnd} and for a name the netlist does not have
     */
    public int nodeIndex(String name) {
        Integer i = nodeIndex.get(name);
        return i == null ? GROUND : i;
    }

    double initialState(int slot) {
        return initialStates[slot];
    }

    /** @return number of non-ground nodes */
    public int nodeCount() {
        return nodeNames.size();
    }

    /** @return number of voltage-defined branches */
    public int branchCount() {
        return branchNames.size();
    }

    /** @return number of unknowns, nodes plus branches */
    public int unknownCount() {
        return nodeNames.size() + branchNames.size();
    }

    /** @return number of state slots */
    public int stateCount() {
        return initialStates.length;
    }

    /** @return a fresh copy of the initial state slots */
    public double[] initialStates() {
        return initialStates.clone();
    }

    /** @return all elements in stamping order */
    public List<Element> elements() {
        return elements;
    }

    /** @return the part networks in drawing order (ground symbols included, with no elements) */
    public List<PartNetwork> parts() {
        return parts;
    }

    /**
     * @param ref a designator
     * @return the index of its part network in {@link #parts()}, or −1 if there is none
     */
    public int partIndex(String ref) {
        Integer i = partIndex.get(ref);
        return i == null ? -1 : i;
    }

    /**
     * @param ref a designator
     * @return that part's network
     */
    public Optional<PartNetwork> part(String ref) {
        int i = partIndex(ref);
        return i < 0 ? Optional.empty() : Optional.of(parts.get(i));
    }

    /** @return node of every net of the drawing that has a pin, by net name; {@code gnd} maps to {@link #GROUND} */
    public Map<String, Integer> netNodes() {
        return netNodes;
    }

    /**
     * @param node a node index
     * @return the net name, or the internal node's name ({@code Q1.b'}), or {@code gnd}
     */
    public String nodeName(int node) {
        return node < 0 ? "gnd" : nodeNames.get(node);
    }

    /**
     * @param unknown an unknown index
     * @return the node name, or "current of V1" for a branch
     */
    public String unknownName(int unknown) {
        if (unknown < nodeNames.size()) {
            return nodeNames.get(unknown);
        }
        return "current of " + branchNames.get(unknown - nodeNames.size());
    }

    /**
     * @param node a node index
     * @return labels of the elements with a terminal on that node
     */
    public List<String> elementsAt(int node) {
        List<String> out = new ArrayList<>();
        for (Element e : elements) {
            for (int t : e.terminals()) {
                if (t == node) {
                    if (!out.contains(e.label())) {
                        out.add(e.label());
                    }
                    break;
                }
            }
        }
        return out;
    }

    /** @return the relays of the netlist */
    public List<RelayHandle> relays() {
        List<RelayHandle> out = new ArrayList<>();
        for (PartNetwork p : parts) {
            p.relay().ifPresent(out::add);
        }
        return out;
    }
}
