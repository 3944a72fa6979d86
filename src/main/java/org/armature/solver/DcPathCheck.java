package org.armature.solver;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.TreeSet;
import org.armature.netlist.Element;
import org.armature.netlist.Netlist;

/**
 * Structural checks done once per netlist, before any matrix is built, so that a singular circuit is
 * reported by name rather than by a zero pivot: every node needs a DC path to ground (through
 * elements that conduct at DC), and no loop may consist only of voltage sources.
 */
public final class DcPathCheck {

    private DcPathCheck() {
    }

    /**
     * @param netlist the netlist
     * @throws SingularCircuitException naming the floating nodes (and the parts on them) or the
     *     parts of a voltage-source loop
     */
    public static void check(Netlist netlist) {
        int n = netlist.nodeCount();
        int groundSlot = n;
        // voltage-source loops: union-find over source pairs only
        int[] srcParent = identity(n + 1);
        List<int[]> sourceEdges = new ArrayList<>();
        List<String> sourceLabels = new ArrayList<>();
        for (Element e : netlist.elements()) {
            for (int[] pair : e.voltageSourcePairs()) {
                int a = slot(pair[0], groundSlot);
                int b = slot(pair[1], groundSlot);
                if (find(srcParent, a) == find(srcParent, b)) {
                    List<String> loop = path(sourceEdges, sourceLabels, a, b, n + 1);
                    loop.add(e.label());
                    throw new SingularCircuitException(SingularCircuitException.Cause.VOLTAGE_SOURCE_LOOP,
                            List.of(netlist.nodeName(pair[0]), netlist.nodeName(pair[1])), loop,
                            "voltage sources form a loop: " + String.join(", ", loop)
                                    + " fix the voltage between " + netlist.nodeName(pair[0]) + " and "
                                    + netlist.nodeName(pair[1]) + " more than once");
                }
                union(srcParent, a, b);
                sourceEdges.add(new int[] {a, b});
                sourceLabels.add(e.label());
            }
        }
        // floating nodes: union-find over DC-conducting pairs
        int[] parent = identity(n + 1);
        for (Element e : netlist.elements()) {
            for (int[] pair : e.conductingPairs()) {
                union(parent, slot(pair[0], groundSlot), slot(pair[1], groundSlot));
            }
        }
        int groundRoot = find(parent, groundSlot);
        List<String> floating = new ArrayList<>();
        TreeSet<String> parts = new TreeSet<>();
        for (int i = 0; i < n; i++) {
            if (find(parent, i) != groundRoot) {
                floating.add(netlist.nodeName(i));
                parts.addAll(netlist.elementsAt(i));
            }
        }
        if (!floating.isEmpty()) {
            throw new SingularCircuitException(SingularCircuitException.Cause.FLOATING_NODE, floating,
                    List.copyOf(parts), (floating.size() == 1 ? "node " : "nodes ") + String.join(", ", floating)
                            + (floating.size() == 1 ? " has" : " have") + " no DC path to ground (parts there: "
                            + String.join(", ", parts) + "); add a resistor to ground or connect the pin");
        }
    }

    private static int slot(int node, int groundSlot) {
        return node < 0 ? groundSlot : node;
    }

    /** Labels of the source edges on the path from a to b (breadth-first over the source edges). */
    private static List<String> path(List<int[]> edges, List<String> labels, int from, int to, int size) {
        int[] viaEdge = new int[size];
        int[] prev = new int[size];
        java.util.Arrays.fill(viaEdge, -2);
        Deque<Integer> queue = new ArrayDeque<>();
        queue.add(from);
        viaEdge[from] = -1;
        while (!queue.isEmpty()) {
            int u = queue.poll();
            if (u == to) {
                break;
            }
            for (int k = 0; k < edges.size(); k++) {
                int[] e = edges.get(k);
                int w = e[0] == u ? e[1] : (e[1] == u ? e[0] : -1);
                if (w >= 0 && viaEdge[w] == -2) {
                    viaEdge[w] = k;
                    prev[w] = u;
                    queue.add(w);
                }
            }
        }
        List<String> out = new ArrayList<>();
        for (int v = to; v != from && viaEdge[v] >= 0; v = prev[v]) {
            out.add(labels.get(viaEdge[v]));
        }
        return out;
    }

    private static int[] identity(int size) {
        int[] p = new int[size];
        for (int i = 0; i < size; i++) {
            p[i] = i;
        }
        return p;
    }

    private static int find(int[] p, int i) {
        while (p[i] != i) {
            p[i] = p[p[i]];
            i = p[i];
        }
        return i;
    }

    private static void union(int[] p, int a, int b) {
        int ra = find(p, a);
        int rb = find(p, b);
        if (ra != rb) {
            p[rb] = ra;
        }
    }
}
