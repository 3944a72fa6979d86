package org.armature.cli;

import java.util.ArrayList;
import java.util.List;
import org.armature.analysis.faults.Fault;
import org.armature.analysis.faults.FaultCatalog;
import org.armature.analysis.faults.FaultInjector;
import org.armature.analysis.faults.Meter;
import org.armature.model.Stage;
import picocli.CommandLine.Option;

/**
 * The fault-hunt options shared by commands: {@code --fault PART:KIND} of {@code solve} and
 * {@code simulate}, and the meter of {@code faults} and {@code diagnose} ({@link MeterOptions}).
 */
final class FaultOptions {

    private FaultOptions() {
    }

    /**
     * The stage with the faults written on the command line.
     *
     * @param stage the stage as read
     * @param texts the faults as written ({@code PART:KIND}, {@code NET~TOWARD:track-open} or
     *     {@code PART.PIN:track-open}), possibly none
     * @return the faulted stage
     * @throws CommandFailedException naming what is valid, for an unknown part, net or fault kind
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
        try {
            return FaultInjector.apply(stage, faults);
        } catch (IllegalArgumentException e) {
            // a track that one cut cannot open in this drawing (pins on one point, a loop of wires)
            throw new CommandFailedException(e.getMessage());
        }
    }

    /** The meter options of {@code faults} and {@code diagnose}. */
    static final class MeterOptions {

        @Option(names = "--meter-resistance", paramLabel = "OHMS", converter = QuantityConverter.Ohms.class,
                description = "The meter's input resistance (default 10M).")
        Double meterOhms;

        @Option(names = "--meter-accuracy", paramLabel = "PCT%+DIGITS",
                description = "The meter's DC volts accuracy, percent of the reading plus digits of the last place "
                        + "(default 1%+2), for example 0.5%+3.")
        String accuracy;

        @Option(names = "--meter-counts", paramLabel = "N",
                description = "The meter's display counts, which set its ranges (default 4000), for example 6000.")
        String counts;

        /** True when any meter option was given. */
        boolean given() {
            return meterOhms != null || accuracy != null || counts != null;
        }

        /**
         * The meter: {@code base} with every option given put in.
         *
         * @throws CommandFailedException with one sentence and an example, for a bad value
         */
        Meter apply(Meter base) {
            Meter m = base;
            try {
                if (meterOhms != null) {
                    m = m.withInputOhms(meterOhms);
                }
                if (accuracy != null) {
                    m = m.withAccuracy(accuracy);
                }
                if (counts != null) {
                    m = m.withCounts(counts);
                }
            } catch (IllegalArgumentException e) {
                String msg = e.getMessage();
                throw new CommandFailedException(msg.startsWith("inputOhms")
                        ? "The meter's input resistance must be positive (for example 10M), not " + meterOhms + "."
                        : msg);
            }
            return m;
        }
    }
}
