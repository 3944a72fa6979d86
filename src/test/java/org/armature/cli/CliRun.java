package org.armature.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/** One in-process run of the command line, with its captured streams. */
record CliRun(int status, String out, String err) {

    static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int status = ArmatureCli.run(args, new PrintWriter(out), new PrintWriter(err));
        return new CliRun(status, out.toString(), err.toString());
    }

    /** True when the error stream shows no sign of a stack trace. */
    boolean noStackTrace() {
        return !err.contains("\tat ") && !err.contains("Exception") && !out.contains("\tat ");
    }
}
