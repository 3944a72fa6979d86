package org.armature.ui;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.prefs.Preferences;

/**
 * The recently used stage files, kept in the user's preferences under the node named by the system
 * property {@code armature.prefs.node} (tests use their own node), at most {@value #MAX} entries.
 */
public final class RecentFiles {

    /** Most entries kept. */
    public static final int MAX = 8;

    /** System property naming the user preferences node (default {@code armature}; tests use their own). */
    public static final String PREFS_NODE_PROPERTY = "armature.prefs.node";

    private final Preferences prefs;

    /** Recent files in the configured preferences node. */
    public RecentFiles() {
        this.prefs = preferences();
    }

    /** The application's user preferences node, named by {@value #PREFS_NODE_PROPERTY}. */
    public static Preferences preferences() {
        return Preferences.userRoot().node(System.getProperty(PREFS_NODE_PROPERTY, "armature"));
    }

    /** The files, newest first. */
    public List<Path> list() {
        List<Path> out = new ArrayList<>();
        for (int i = 0; i < MAX; i++) {
            String s = prefs.get("recent." + i, "");
            if (!s.isEmpty()) {
                out.add(Path.of(s));
            }
        }
        return out;
    }

    /** Puts a file first. */
    public void add(Path file) {
        List<Path> l = new ArrayList<>(list());
        Path abs = file.toAbsolutePath();
        l.remove(abs);
        l.add(0, abs);
        for (int i = 0; i < MAX; i++) {
            if (i < l.size()) {
                prefs.put("recent." + i, l.get(i).toString());
            } else {
                prefs.remove("recent." + i);
            }
        }
    }
}
