package org.armature.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** The top command {@code armature}: help, version, and the subcommands of {@link ArmatureCli#SUBCOMMANDS}. */
@Command(name = "armature", mixinStandardHelpOptions = true, version = ArmatureCli.VERSION,
        description = {"Design and troubleshoot relay driver stages: logic pin, transistor, relay coil, suppressor.",
                "With no arguments the launcher opens the window; with arguments it runs these commands "
                        + "without any display."},
        footer = {"", "Run 'armature COMMAND --help' for the options of a command."})
final class ArmatureCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        throw new CommandLine.ParameterException(spec.commandLine(),
                "Name a command, for example 'armature new --help'.");
    }
}
