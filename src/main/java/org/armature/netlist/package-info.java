/**
 * The netlist: a stage flattened into stampable elements for modified nodal analysis (Ho, Ruehli,
 * Brennan, IEEE Trans. Circuits Syst. CAS-22, 1975).
 *
 * <p>{@link org.armature.netlist.NetlistBuilder#flatten} turns a {@link org.armature.model.Stage}
 * into a {@link org.armature.netlist.Netlist}: one node per net of the drawing that has a pin
 * (from {@link org.armature.model.Connectivity}; {@code gnd} is the reference), internal nodes for
 * series resistances, one or several {@link org.armature.netlist.Element}s per part (a Darlington
 * channel becomes two transistors, three resistors and a clamp diode; a relay becomes its coil, two
 * switched contacts and the coil–contact insulation), and a {@link org.armature.netlist.PartNetwork}
 * per part that reads the part's quantities back from a solution under stable keys.
 *
 * <p>Every element stamps through one narrow interface, {@link org.armature.netlist.Stamper}:
 * conductance between two nodes, transconductance, current into a node, a voltage-defined branch
 * (with an optional series resistance for an inductor's companion model). Device equations come
 * from {@code org.armature.devices}; the elements here only linearise them at the Newton iterate and
 * apply the devices' junction limiting. A transient engine adds its companion models as further
 * elements, reading the step from {@link org.armature.netlist.StampContext} and keeping history in
 * {@link org.armature.netlist.Element#accept}.
 *
 * <p>Element states that are not node voltages (relay coil temperature, contact state) live in
 * state slots of the solution, so a result snapshot carries them and reading it never depends on
 * mutable element fields.
 */
package org.armature.netlist;
