package org.armature.model;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A fault hunt as the technician made it on one stage of the document: the symptom seen, the meter
 * used, the readings taken and any prior weights they changed. Only what was entered is kept; the
 * ranking and the next measurement are computed again from it wherever they are shown (window,
 * {@code diagnose}, report), so they always come from the engine of the day.
 *
 * <p>This layer holds plain data: the symptom and the fault kinds are kept by their command-line
 * words ({@code no-operate}, {@code ce-short}, ...) and checked where they are used
 * ({@code analysis.faults}).
 *
 * @param stageIndex the stage hunted on, by index into {@link StageDocument#stages()} from 0
 * @param symptom the symptom's word, if one was entered ({@code no-operate}, {@code no-release},
 *     {@code chatter})
 * @param meter the meter the readings were taken with
 * @param readings the readings in the order they were taken
 * @param priorWeights prior weights the technician changed, by fault kind word ({@code none} for the
 *     healthy stage); kinds not named keep their default weight
 */
public record FaultHunt(int stageIndex, Optional<String> symptom, MeterSetting meter, List<HuntReading> readings,
                        Map<String, Double> priorWeights) {

    /** The key of {@link #priorWeights} that weighs the healthy stage. */
    public static final String NONE = "none";

    public FaultHunt {
        if (stageIndex < 0) {
            throw new IllegalArgumentException("stageIndex must not be negative, was " + stageIndex);
        }
        symptom = symptom == null ? Optional.empty() : symptom;
        if (meter == null) {
            throw new IllegalArgumentException("a fault hunt needs its meter");
        }
        readings = List.copyOf(readings);
        Map<String, Double> copy = new LinkedHashMap<>();
        for (Map.Entry<String, Double> e : priorWeights.entrySet()) {
            if (e.getKey() == null || e.getKey().isBlank()) {
                throw new IllegalArgumentException("a prior weight needs a fault kind");
            }
            double w = e.getValue();
            if (!(w >= 0) || Double.isInfinite(w)) {
                throw new IllegalArgumentException("the prior weight of " + e.getKey()
                        + " must be a finite number not below 0, was " + w);
            }
            copy.put(e.getKey(), w);
        }
        priorWeights = java.util.Collections.unmodifiableMap(copy);
    }

    /** An empty hunt on a stage: no symptom, the default meter, no readings, default priors. */
    public static FaultHunt start(int stageIndex) {
        return new FaultHunt(stageIndex, Optional.empty(), MeterSetting.DEFAULT, List.of(), Map.of());
    }

    /** A copy with this symptom (or none). */
    public FaultHunt withSymptom(Optional<String> newSymptom) {
        return new FaultHunt(stageIndex, newSymptom, meter, readings, priorWeights);
    }

    /** A copy with this meter. */
    public FaultHunt withMeter(MeterSetting newMeter) {
        return new FaultHunt(stageIndex, symptom, newMeter, readings, priorWeights);
    }

    /** A copy with these readings. */
    public FaultHunt withReadings(List<HuntReading> newReadings) {
        return new FaultHunt(stageIndex, symptom, meter, newReadings, priorWeights);
    }

    /** A copy with these changed prior weights. */
    public FaultHunt withPriorWeights(Map<String, Double> newWeights) {
        return new FaultHunt(stageIndex, symptom, meter, readings, newWeights);
    }

    /** A copy on another stage index (stages were reordered or deleted). */
    public FaultHunt onStage(int newIndex) {
        return new FaultHunt(newIndex, symptom, meter, readings, priorWeights);
    }

    /**
     * One meter reading.
     *
     * @param net the probe point's name, as {@code solve} prints it
     * @param pinHigh the drive pin's state during the reading
     * @param volts the value shown, volts
     */
    public record HuntReading(String net, boolean pinHigh, double volts) {
        public HuntReading {
            if (net == null || net.isBlank()) {
                throw new IllegalArgumentException("a reading needs a probe point");
            }
            if (!Double.isFinite(volts)) {
                throw new IllegalArgumentException("a reading must be a finite number of volts, was " + volts);
            }
        }
    }

    /**
     * The meter of a hunt: input resistance, display counts and accuracy ±(percent of reading +
     * digits).
     *
     * @param inputOhms input resistance, ohms, positive and finite
     * @param counts display counts, at least 10
     * @param percentOfReading accuracy, percent of reading, not negative
     * @param digits accuracy, digits of the range's last place, not negative
     */
    public record MeterSetting(double inputOhms, int counts, double percentOfReading, double digits) {

        /** A 4,000-count handheld meter, ±(1 % + 2 digits), 10 MΩ input (common practice). */
        public static final MeterSetting DEFAULT = new MeterSetting(10e6, 4000, 1, 2);

        public MeterSetting {
            if (!(inputOhms > 0) || Double.isInfinite(inputOhms)) {
                throw new IllegalArgumentException("the meter's input resistance must be positive and finite, was "
                        + inputOhms);
            }
            if (counts < 10) {
                throw new IllegalArgumentException("the meter's counts must be at least 10, was " + counts);
            }
            if (!(percentOfReading >= 0) || Double.isInfinite(percentOfReading)
                    || !(digits >= 0) || Double.isInfinite(digits)) {
                throw new IllegalArgumentException("the meter's accuracy (percent and digits) must be finite and not negative");
            }
        }
    }
}
