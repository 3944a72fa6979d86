package org.armature.bench;

import org.armature.model.Connectivity;
import org.armature.model.Stage;

/** The nets as drawn, without roles, and a recognition past the memo, for {@link RolesBench}. */
final class StageRecognitionAccess {

    private StageRecognitionAccess() {
    }

    /** A recognition found anew, past the memo of {@link org.armature.model.StageRecognition#of}. */
    static org.armature.model.StageRecognition recognise(Stage stage) {
        return org.armature.model.ConnectivityProbe.recognise(stage);
    }

    static Connectivity drawn(Stage stage) {
        return org.armature.model.ConnectivityProbe.drawn(stage);
    }
}
