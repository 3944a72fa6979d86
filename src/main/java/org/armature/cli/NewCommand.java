package org.armature.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.armature.analysis.SuppressorAdvisor;
import org.armature.devices.ContactLoad;
import org.armature.devices.LoadKind;
import org.armature.io.StageFiles;
import org.armature.model.ContactProtection;
import org.armature.model.Finding;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.model.StageRoles;
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

    @Option(names = "--contact-waveform", paramLabel = "dc|ac", converter = Choices.Waveform.class,
            description = "Whether the contact-side rail is DC (default) or AC (then --contact-supply is RMS and the"
                    + " AC contact rating applies).")
    Choices.ContactWaveform contactWaveform;

    @Option(names = "--load", paramLabel = "KIND", converter = Choices.Load.class,
            description = "What the contacts switch: resistive, lamp (default), motor, solenoid, capacitive or led.")
    LoadKind loadKind;

    @Option(names = "--insulation-class", paramLabel = "CLASS", converter = Choices.InsulationClass.class,
            description = "Coil insulation thermal class (IEC 60085): Y, A, E, B (default), F, H, N or R.")
    Double insulationCelsius;

    @Option(names = "--contact-protection", paramLabel = "KIND", converter = Choices.Protection.class,
            description = "Across the contacts: none (default), rc, varistor; or diode across a DC load. Sized by the"
                    + " rules of thumb unless given below.")
    ContactProtection protection;

    @Option(names = "--protection-resistance", paramLabel = "OHMS", converter = QuantityConverter.Ohms.class,
            description = "Resistor of the rc contact protection, ohms (default 0.5 Ω per contact volt, E12).")
    Double protectionOhms;

    @Option(names = "--protection-capacitance", paramLabel = "FARADS", converter = QuantityConverter.Farads.class,
            description = "Capacitor of the rc contact protection, farads (default 1 µF per contact amp, E6).")
    Double protectionFarads;

    @Option(names = "--varistor-voltage", paramLabel = "VOLTS", converter = QuantityConverter.Volts.class,
            description = "Clamping voltage of the varistor contact protection, volts (default the E24 value at or"
                    + " above 1.1 × the rail's crest).")
    Double varistorVolts;

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
        stage = contactSide(stage, cl);
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

    /** The contact side's words: waveform, load kind, insulation class, resistance from power, protection. */
    private Stage contactSide(Stage stage, CommandLine cl) {
        Stage s = stage;
        if (contactWaveform != null) {
            s = s.updatePart("V2", v -> v.withOption("waveform",
                    contactWaveform == Choices.ContactWaveform.AC ? "ac-rms" : "dc"));
        }
        if (loadKind != null) {
            s = s.updatePart("E1", e -> e.withOption("loadKind", loadKind.id()));
        }
        if (insulationCelsius != null) {
            s = s.updatePart("K1", k -> k.with("insulationClassCelsius", insulationCelsius));
        }
        boolean resistanceGiven = spec.findOption(StageValue.LOAD_RESISTANCE.optionName()).getValue() != null;
        boolean railOrLoadChanged = contactWaveform != null || loadKind != null
                || spec.findOption(StageValue.CONTACT_SUPPLY.optionName()).getValue() != null
                || spec.findOption(StageValue.LOAD_POWER.optionName()).getValue() != null;
        Part e = s.require("E1");
        if (!resistanceGiven && railOrLoadChanged && e.value("ratedWatts") > 0) {
            // keep the load's rated power true on the new rail: a 12 W lamp on 230 V is 4.4 kΩ, not 48 Ω
            Part v2 = s.require("V2");
            boolean ac = v2.option("waveform").equals("ac-rms");
            try {
                double ohms = physics(e).resistanceForPower(v2.value("volts"), ac, e.value("ratedWatts"));
                s = s.withPart(e.with("resistanceOhms", ohms));
            } catch (IllegalArgumentException ex) {
                throw usage("--load-power " + e.value("ratedWatts") + " W gives no load resistance on the "
                        + v2.value("volts") + " V contact rail; give --load-resistance.");
            }
        }
        ContactProtection p = protection == null ? ContactProtection.NONE : protection;
        if (p == ContactProtection.NONE) {
            if (protectionOhms != null || protectionFarads != null || varistorVolts != null) {
                throw usage("--protection-resistance, --protection-capacitance and --varistor-voltage need"
                        + " --contact-protection rc or varistor.");
            }
            return s;
        }
        if (p == ContactProtection.DIODE && s.require("V2").option("waveform").equals("ac-rms")) {
            throw usage("--contact-protection diode applies only to a DC contact rail; use rc or varistor on AC.");
        }
        SuppressorAdvisor.ContactSizing size = SuppressorAdvisor.contactSizing(s).orElseThrow(() ->
                usage("--contact-protection needs a contact side with a rail and a load."));
        try {
            return Templates.withContactProtection(s, p, protectionOhms != null ? protectionOhms : size.rcOhms(),
                    protectionFarads != null ? protectionFarads : size.rcFarads(),
                    varistorVolts != null ? varistorVolts : size.varistorVolts());
        } catch (IllegalArgumentException ex) {
            throw usage(ex.getMessage() + ".");
        }
    }

    private static ContactLoad physics(Part e) {
        return new ContactLoad(LoadKind.of(e.option("loadKind")), e.value("resistanceOhms"), e.value("inrushMultiple"),
                e.value("inrushSeconds"), e.value("powerFactor"), e.value("inductanceHenries"), e.value("filamentKelvin"),
                e.value("capacitanceFarads"), e.value("loopResistanceOhms"), e.value("forwardVolts"), e.value("ratedWatts"));
    }

    private Stage apply(Stage stage, StageValue v, double value, Suppressor supp, HighSideDrive d) {
        StageRoles roles = StageRecognition.of(stage).roles().orElseThrow(() -> new IllegalStateException(
                "every template is a recognised stage: " + describe(supp, d)));
        String ref = v.role().ref(stage, roles).orElseThrow(() -> usage(v.optionName()
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
