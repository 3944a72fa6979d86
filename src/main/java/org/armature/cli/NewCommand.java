package org.armature.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.armature.io.StageFiles;
import org.armature.model.Finding;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.model.Validator;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code armature new TEMPLATE [options] -o FILE}: writes a stage file holding one of the four ready
 * stages, with the values given on the command line and the template's defaults for the rest.
 *
 * <p>The numeric options come from {@link StageValue} and are added to the command in
 * {@link #commandLine()}. The stage is validated before it is written: an ERROR finding (a value out
 * of range, must-release above must-operate) is a usage error and nothing is written; warnings are
 * printed and the file is written.
 */
@Command(name = "new", sortOptions = false, mixinStandardHelpOptions = true,
        description = {"Write a stage file from a ready stage, with changed values.",
                "Values take engineering notation: 4k7, 22k, 3.3 V, 100n, 1.5e-3. Options left out keep "
                        + "the template's typical values."},
        footer = {"", "Example:", "  armature new low-side-npn --supply 24 --coil-resistance 1k5 \\",
                "      --base-resistor 1k8 -o valve.stage.json"})
final class NewCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "TEMPLATE", converter = Choices.Template.class,
            description = "low-side-npn, low-side-nmos, darlington-channel or high-side-pnp.")
    StageTemplate template;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "FILE",
            description = "Stage file to write (name it *.stage.json).")
    Path output;

    @Option(names = "--force", description = "Replace FILE if it already exists.")
    boolean force;

    @Option(names = "--name", paramLabel = "TEXT", description = "Name of the stage (default: the template's).")
    String name;

    @Option(names = "--suppressor", paramLabel = "KIND", converter = Choices.SuppressorKind.class,
            description = "Across the coil: none, diode (default), diode-zener, rc, tvs or resistor. For the "
                    + "Darlington channel, diode is the channel's own clamp diode.")
    Suppressor suppressor;

    @Option(names = "--drive", paramLabel = "KIND", converter = Choices.Drive.class,
            description = "High side only: level-shift (default; an NPN turns the PNP on) or direct (pin "
                    + "drives the PNP base; cannot turn off when the supply is above the pin's high level).")
    HighSideDrive drive;

    @Option(names = "--pin-state", paramLabel = "STATE", converter = Choices.Pin.class,
            description = "Pin state stored for the operating point: high (default) or low.")
    Choices.PinState pinState;

    @Option(names = "--ambient", paramLabel = "°C", converter = QuantityConverter.Celsius.class,
            description = "Nominal ambient temperature, °C (default 25).")
    Double ambient;

    /** The command with its numeric options added from {@link StageValue}. */
    static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new NewCommand());
        CommandSpec s = cl.getCommandSpec();
        for (StageValue v : StageValue.values()) {
            s.addOption(OptionSpec.builder(v.optionName())
                    .paramLabel(v.label())
                    .type(Double.class)
                    .converters(new QuantityConverter(v.unit()))
                    .description(v.description())
                    .build());
        }
        return cl;
    }

    @Override
    public Integer call() {
        CommandLine cl = spec.commandLine();
        Suppressor supp = suppressor == null ? Suppressor.DIODE : suppressor;
        if (drive != null && template != StageTemplate.HIGH_SIDE_PNP) {
            throw usage("--drive applies only to the high-side-pnp template, not to " + template.id() + ".");
        }
        HighSideDrive d = drive == null ? HighSideDrive.LEVEL_SHIFT : drive;
        Stage stage = Templates.build(template, supp, d);
        for (StageValue v : StageValue.values()) {
            Double value = spec.findOption(v.optionName()).getValue();
            if (v == StageValue.SUPPLY && value != null && !(value > 0)) {
                // every template switches a positive coil rail: a reversed one forward-biases the freewheeling diode
                throw usage("--supply must be a positive coil rail (the templates switch a positive supply; a reversed"
                        + " one would forward-bias the freewheeling diode): expected a value above 0 V up to 1000 V.");
            }
            if (value != null) {
                stage = apply(stage, v, value, supp, d);
            }
        }
        if (pinState != null) {
            stage = stage.withConditions(stage.conditions().withPinHigh(pinState.isHigh()));
        }
        if (ambient != null) {
            stage = stage.withConditions(stage.conditions().withAmbient(ambient));
        }
        if (name != null) {
            stage = stage.withName(name);
        }
        List<Finding> findings = Validator.validate(stage);
        List<String> errors = findings.stream().filter(f -> f.severity() == Severity.ERROR).map(Finding::message).toList();
        if (!errors.isEmpty()) {
            throw usage(String.join(" ", errors) + " Nothing was written.");
        }
        if (Files.exists(output) && !force) {
            throw new CommandFailedException(output + " already exists; add --force to replace it.");
        }
        StageFiles.save(StageDocument.of(stage), output);
        PrintWriter err = cl.getErr();
        for (Finding f : findings) {
            if (f.severity() == Severity.WARNING) {
                err.println("warning: " + f.message());
            }
        }
        err.flush();
        PrintWriter out = cl.getOut();
        out.println("Wrote " + template.title() + " stage \"" + stage.name() + "\" to " + output + ".");
        out.flush();
        return CommandLine.ExitCode.OK;
    }

    private Stage apply(Stage stage, StageValue v, double value, Suppressor supp, HighSideDrive d) {
        String ref = v.role().ref(template, supp, d, stage).orElseThrow(() -> usage(v.optionName()
                + " does not apply to " + describe(supp, d) + ": it has no " + v.role().words() + "."));
        Part part = stage.require(ref);
        if (part.kind().param(v.key()).isEmpty()) {
            throw usage(v.optionName() + " does not apply to " + describe(supp, d) + ": its " + ref + " ("
                    + part.kind().title() + ") has no parameter " + v.key() + ".");
        }
        return stage.withPart(part.with(v.key(), value));
    }

    private String describe(Suppressor supp, HighSideDrive d) {
        String drivePart = template == StageTemplate.HIGH_SIDE_PNP ? ", " + d.id() : "";
        return template.id() + drivePart + " with suppressor " + supp.id();
    }

    private CommandLine.ParameterException usage(String sentence) {
        return new CommandLine.ParameterException(spec.commandLine(), sentence);
    }
}
