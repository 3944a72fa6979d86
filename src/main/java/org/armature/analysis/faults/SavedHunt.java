package org.armature.analysis.faults;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;
import org.armature.model.FaultHunt;
import org.armature.model.Stage;

/**
 * Turns a {@link FaultHunt} kept in a document into the inputs of a {@link Diagnosis} and ranks it:
 * the one way the window, {@code diagnose} and the report compute a saved hunt's ranking, so they
 * agree. Every word of the saved hunt is checked here; a bad one is one sentence naming what is valid.
 */
public final class SavedHunt {

    private SavedHunt() {
    }

    /** The analysis meter of a saved meter setting. */
    public static Meter meter(FaultHunt.MeterSetting m) {
        return new Meter(m.inputOhms(), m.counts(), m.percentOfReading(), m.digits());
    }

    /** The saved setting of an analysis meter. */
    public static FaultHunt.MeterSetting setting(Meter m) {
        return new FaultHunt.MeterSetting(m.inputOhms(), m.counts(), m.percentOfReading(), m.digits());
    }

    /**
     * The priors: the defaults with the saved weights put in.
     *
     * @throws IllegalArgumentException naming the valid words for an unknown fault kind
     */
    public static Priors priors(Map<String, Double> weights) {
        Priors p = Priors.DEFAULT;
        for (Map.Entry<String, Double> e : weights.entrySet()) {
            p = p.set(e.getKey(), e.getValue());
        }
        return p;
    }

    /**
     * The symptom of a saved word.
     *
     * @throws IllegalArgumentException naming the valid words
     */
    public static Optional<Symptom> symptom(Optional<String> word) {
        if (word.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(Symptom.byId(word.get()).orElseThrow(() -> new IllegalArgumentException(
                "No symptom '" + word.get() + "'; valid: "
                        + Arrays.stream(Symptom.values()).map(Symptom::id).collect(Collectors.joining(", ")) + ".")));
    }

    /**
     * The readings, checked against the dictionary's probe points.
     *
     * @throws IllegalArgumentException naming the valid probe points
     */
    public static List<Reading> readings(FaultDictionary d, List<FaultHunt.HuntReading> saved) {
        List<Reading> out = new ArrayList<>();
        for (FaultHunt.HuntReading r : saved) {
            if (d.probeIndex(r.net()) < 0) {
                throw new IllegalArgumentException("No probe point '" + r.net() + "' in stage \"" + d.stage().name()
                        + "\"; valid: " + d.probes().stream().map(Probe::name).collect(Collectors.joining(", ")) + ".");
            }
            out.add(new Reading(r.net(), r.pinHigh(), r.volts()));
        }
        return out;
    }

    /**
     * A saved hunt ranked on its stage: the dictionary built with the hunt's meter, the ranking
     * with its priors, symptom and readings.
     *
     * @param dictionary the dictionary built with the hunt's meter
     * @param result the ranking and the next measurement
     * @param spread the spread of each reading the ranking used (and its ambiguity groups use)
     */
    public record Ranked(FaultDictionary dictionary, Diagnosis.Result result, Spread spread) {
    }

    /**
     * Ranks a saved hunt on the stage it names.
     *
     * @param stage the stage hunted on (as the document holds it)
     * @param hunt the saved hunt
     * @return the dictionary and the ranking
     * @throws IllegalArgumentException for a bad word in the hunt, one sentence naming what is valid
     */
    public static Ranked rank(Stage stage, FaultHunt hunt) {
        // the words first, so a bad one is said before the dictionary is built
        priors(hunt.priorWeights());
        symptom(hunt.symptom());
        return rank(FaultDictionary.build(stage, meter(hunt.meter())), hunt);
    }

    /**
     * Ranks a hunt on a dictionary already built with its meter (the window keeps one per stage and
     * meter; {@code diagnose} builds one for its options): the one place a hunt's words become a
     * {@link Diagnosis}.
     *
     * @throws IllegalArgumentException for a bad word in the hunt, one sentence naming what is valid
     */
    public static Ranked rank(FaultDictionary d, FaultHunt hunt) {
        Spread spread = Spread.DEFAULT;
        return new Ranked(d, Diagnosis.rank(d, spread, priors(hunt.priorWeights()), symptom(hunt.symptom()),
                readings(d, hunt.readings())), spread);
    }
}
