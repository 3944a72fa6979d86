package org.armature.bench;

import org.armature.model.Connectivity;
import org.armature.model.Stage;

/** The nets as drawn, without roles, for {@link RolesBench}'s comparison. */
final class StageRecognitionAccess {

    private StageRecognitionAccess() {
    }

    static Connectivity drawn(Stage stage) {
        return org.armature.model.ConnectivityProbe.drawn(stage);
    }
}
