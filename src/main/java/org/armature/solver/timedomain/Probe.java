package org.armature.solver.timedomain;

import java.util.function.ToDoubleFunction;
import org.armature.netlist.Solution;

/**
 * A quantity sampled at every accepted point, evaluated before the reactive elements commit (so a
 * companion element's current is that of the step just solved).
 *
 * @param name trace name
 * @param unit SI unit symbol
 * @param reader how to read it from a solution
 */
record Probe(String name, String unit, ToDoubleFunction<Solution> reader) {
}
