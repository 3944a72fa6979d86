package org.armature.solver.timedomain;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.armature.netlist.Element;
import org.armature.netlist.Solution;

/**
 * A circuit prepared for a run: the elements shared by both drive levels, the drive elements of each
 * level, the reactive elements and relays, and what to record. Built by {@link TransientAnalysis}
 * from a stage, or by hand in tests. Holds the {@link StepState} its reactive elements read, so one
 * circuit serves one run at a time.
 */
final class TimeDomainCircuit {

    final StepState step = new StepState();
    final int nodeCount;
    final int branchCount;
    final double[] initialStates;
    final List<Element> common = new ArrayList<>();
    final List<Element> driveLow = new ArrayList<>();
    final List<Element> driveHigh = new ArrayList<>();
    final List<Reactive> reactives = new ArrayList<>();
    final List<RelayDynamics> relays = new ArrayList<>();
    /** Relays with a moving armature (an attracted inductance given); their coils are in {@link #reactives}. */
    final List<ArmatureDynamics> armatures = new ArrayList<>();
    final Map<String, Integer> namedNodes = new LinkedHashMap<>();
    final List<Probe> probes = new ArrayList<>();
    /** Node voltages to start the run's own operating point from (the DC engine's answer), or null. */
    double[] startGuess;
    /** Notes on how the stage was modelled, for the result. */
    final List<String> notes = new ArrayList<>();
    /** One reading of the switch part per recorded point, shared by its power and current probes. */
    final ReadingMemo switchReading = new ReadingMemo();
    final List<SwitchClamp> clamps = new ArrayList<>();

    /** What the metrics are measured on; any may be absent in a hand-built circuit. */
    Probe coilCurrent;
    Probe coilVoltage;
    Probe switchVoltage;
    Probe switchPower;
    Probe suppressorPower;
    Probe suppressorCurrent;
    Probe coilLossPower;
    double dropOutAmps = Double.NaN;
    double storedEnergyHenries = Double.NaN;
    String coilRef = "";
    String switchRef = "";

    private final List<String> nodeNames = new ArrayList<>();

    TimeDomainCircuit(int nodeCount, int branchCount, double[] initialStates) {
        for (int i = 0; i < nodeCount; i++) {
            nodeNames.add("n" + i);
        }
        this.nodeCount = nodeCount;
        this.branchCount = branchCount;
        this.initialStates = initialStates.clone();
    }

    /** Adds a shared element (reactive ones are also registered for the error test). */
    <E extends Element> E add(E e) {
        common.add(e);
        if (e instanceof Reactive r) {
            reactives.add(r);
        }
        if (e instanceof SwitchClamp c) {
            clamps.add(c);
        }
        return e;
    }

    /** Names node i (names must be unique). */
    void nodeName(int i, String name) {
        nodeNames.set(i, name);
    }

    String nodeName(int i) {
        return nodeNames.get(i);
    }

    /** Records the voltage of a node under {@code V(name)}. */
    void node(String name, int node) {
        namedNodes.put(name, node);
    }

    static double v(Solution x, int a, int b) {
        return x.voltage(a) - x.voltage(b);
    }
}
