package org.armature.netlist;

import static org.junit.jupiter.api.Assertions.assertNull;

import java.lang.ref.WeakReference;
import java.util.ArrayList;
import java.util.List;
import org.armature.model.Part;
import org.armature.model.Stage;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * A re-flattened netlist must not keep the netlist it was made from alive: the live editor and the
 * checks re-flatten after every edit and for every corner, so a chain of earlier netlists would grow
 * without bound (it once held every corner's netlist of a check run, hundreds of megabytes).
 */
class ReflattenRetentionTest {

    @Test
    @DisplayName("after a chain of re-flattens, the first netlist can be collected")
    void earlierNetlistsAreNotRetained() {
        Stage s = Templates.defaultStage();
        FlattenOptions fo = FlattenOptions.of(true, 25);
        int r1 = -1;
        for (int i = 0; i < s.parts().size(); i++) {
            if (s.parts().get(i).ref().equals("R1")) {
                r1 = i;
            }
        }
        Netlist first = NetlistBuilder.flatten(s, fo);
        WeakReference<Netlist> firstRef = new WeakReference<>(first);
        Netlist now = first;
        Part base = s.parts().get(r1);
        for (int k = 1; k <= 20; k++) {
            Stage edited = s.withPart(base.with("resistanceOhms", 1000 + k));
            now = NetlistBuilder.reflatten(now, edited, fo, r1).orElseThrow();
        }
        first = null;
        // System.gc() is a request; ask a few times with some garbage in between (common practice)
        for (int attempt = 0; attempt < 10 && firstRef.get() != null; attempt++) {
            List<byte[]> garbage = new ArrayList<>();
            for (int j = 0; j < 16; j++) {
                garbage.add(new byte[1 << 16]);
            }
            garbage.clear();
            System.gc();
        }
        assertNull(firstRef.get(), "the first netlist is still reachable from its re-flattened successors");
        // keep the last one alive to the end, so the chain (if any) had a live head
        assertNull(now.part("no such part").orElse(null));
    }
}
