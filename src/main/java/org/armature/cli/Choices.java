package org.armature.cli;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;
import org.armature.devices.LoadKind;
import org.armature.model.ContactProtection;
import org.armature.model.HighSideDrive;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import picocli.CommandLine;

/** Converters for the word-valued options and parameters; each failure is one sentence. */
final class Choices {

    private Choices() {
    }

    /** Drive pin state for the operating point. */
    enum PinState {
        /** The pin drives its high level: the stage should be on. */
        HIGH("high"),
        /** The pin drives its low level: the stage should be off. */
        LOW("low");

        private final String id;

        PinState(String id) {
            this.id = id;
        }

        String id() {
            return id;
        }

        boolean isHigh() {
            return this == HIGH;
        }
    }

    private static <T> T pick(String text, String what, List<T> all, Function<T, String> id,
                              Function<String, Optional<T>> byId) {
        return byId.apply(text).orElseThrow(() -> new CommandLine.TypeConversionException(
                "\"" + text + "\" is not a " + what + "; choose " + or(all.stream().map(id).toList())));
    }

    /** "a, b or c". */
    static String or(List<String> words) {
        if (words.size() == 1) {
            return words.get(0);
        }
        return String.join(", ", words.subList(0, words.size() - 1)) + " or " + words.get(words.size() - 1);
    }

    /** Reads a template identifier such as {@code low-side-npn}. */
    static final class Template implements CommandLine.ITypeConverter<StageTemplate> {
        @Override
        public StageTemplate convert(String text) {
            return pick(text, "template", List.of(StageTemplate.values()), StageTemplate::id, StageTemplate::byId);
        }
    }

    /** Reads a suppressor identifier such as {@code diode-zener}. */
    static final class SuppressorKind implements CommandLine.ITypeConverter<Suppressor> {
        @Override
        public Suppressor convert(String text) {
            return pick(text, "suppressor", List.of(Suppressor.values()), Suppressor::id, Suppressor::byId);
        }
    }

    /** Reads a high-side drive identifier, {@code direct} or {@code level-shift}. */
    static final class Drive implements CommandLine.ITypeConverter<HighSideDrive> {
        @Override
        public HighSideDrive convert(String text) {
            return pick(text, "drive", List.of(HighSideDrive.values()), HighSideDrive::id, HighSideDrive::byId);
        }
    }

    /** Reads a load kind such as {@code solenoid}. */
    static final class Load implements CommandLine.ITypeConverter<LoadKind> {
        @Override
        public LoadKind convert(String text) {
            return pick(text, "load kind", List.of(LoadKind.values()), LoadKind::id,
                    t -> Arrays.stream(LoadKind.values()).filter(k -> k.id().equals(t)).findFirst());
        }
    }

    /** Reads a contact protection such as {@code rc}. */
    static final class Protection implements CommandLine.ITypeConverter<ContactProtection> {
        @Override
        public ContactProtection convert(String text) {
            return pick(text, "contact protection", List.of(ContactProtection.values()), ContactProtection::id,
                    ContactProtection::byId);
        }
    }

    /** Whether the contact-side rail is DC or AC. */
    enum ContactWaveform {
        /** A DC rail. */
        DC("dc"),
        /** An AC rail, its voltage RMS. */
        AC("ac");

        private final String id;

        ContactWaveform(String id) {
            this.id = id;
        }

        String id() {
            return id;
        }
    }

    /** Reads {@code dc} or {@code ac}. */
    static final class Waveform implements CommandLine.ITypeConverter<ContactWaveform> {
        @Override
        public ContactWaveform convert(String text) {
            return pick(text, "contact waveform", List.of(ContactWaveform.values()), ContactWaveform::id,
                    t -> Arrays.stream(ContactWaveform.values()).filter(w -> w.id().equals(t)).findFirst());
        }
    }

    /** Reads an insulation class letter (IEC 60085) and gives its temperature limit, °C. */
    static final class InsulationClass implements CommandLine.ITypeConverter<Double> {
        private static final List<String> LETTERS = List.of("Y", "A", "E", "B", "F", "H", "N", "R");
        private static final List<Double> CELSIUS = List.of(90.0, 105.0, 120.0, 130.0, 155.0, 180.0, 200.0, 220.0);

        @Override
        public Double convert(String text) {
            String letter = pick(text.toUpperCase(java.util.Locale.ROOT), "thermal class", LETTERS, l -> l,
                    t -> LETTERS.contains(t) ? Optional.of(t) : Optional.empty());
            return CELSIUS.get(LETTERS.indexOf(letter));
        }
    }

    /** Reads {@code high} or {@code low}. */
    static final class Pin implements CommandLine.ITypeConverter<PinState> {
        @Override
        public PinState convert(String text) {
            return pick(text, "pin state", List.of(PinState.values()), PinState::id,
                    t -> Arrays.stream(PinState.values()).filter(p -> p.id().equals(t)).findFirst());
        }
    }
}
