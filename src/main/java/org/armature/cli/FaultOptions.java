package org.armature.cli;

import java.util.ArrayList;
import java.util.List;
import org.armature.analysis.faults.Fault;
import org.armature.analysis.faults.FaultCatalog;
import org.armature.analysis.faults.FaultInjector;
import org.armature.model.Stage;

/** The {@code --fault PART:KIND} option of {@code solve} and {@code simulate}. */
final class FaultOptions {

    private FaultOptions() {
    }

    /**
     * The stage with the faults written on the command line.
     *
     * @param stage the stage as read
     * @param texts the faults as written, possibly none
     * @return the faulted stage
     * @throws CommandFailedException naming what is valid, for an unknown part or fault kind
     */
    static Stage apply(Stage stage, List<String> texts) {
        if (texts == null || texts.isEmpty()) {
            return stage;
        }
        List<Fault> faults = new ArrayList<>();
        for (String t : texts) {
            FaultCatalog.Parsed p = FaultCatalog.parse(stage, t);
            faults.add(p.fault().orElseThrow(() -> new CommandFailedException(p.error())));
        }
        return FaultInjector.apply(stage, faults);
    }
}
