package org.armature.model;

/** Test access to {@link Connectivity#drawn(Stage)} (package-private: callers use the named nets). */
public final class ConnectivityProbe {

    private ConnectivityProbe() {
    }

    /** A recognition found anew, past {@link StageRecognition#of}'s memo (for benchmarks). */
    public static StageRecognition recognise(Stage stage) {
        return StageRecognition.recognise(stage);
    }

    /** The nets as drawn, before role names. */
    public static Connectivity drawn(Stage stage) {
        return Connectivity.drawn(stage);
    }
}
