package org.armature.analysis.faults;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.armature.model.ParamKeys;

/**
 * Ranks the candidates of a {@link FaultDictionary} by posterior probability given the readings and
 * the symptom, and proposes the next measurement (FH-2).
 *
 * <p>Likelihood: each reading is Gaussian about the candidate's expected reading with the spread of
 * {@link Spread#sigma} (meter accuracy and parts' spread, root-sum-square); readings multiply
 * (independent errors). A symptom that the candidate explains has likelihood 1, one it does not
 * {@value #SYMPTOM_MISMATCH} (the symptom may be misreported or intermittent). Posterior ∝
 * likelihood × prior ({@link Priors}).
 *
 * <p>Next measurement: for every probe and pin state not measured yet, the candidates are grouped
 * by their expected reading (sorted; a new group starts where a reading lies beyond twice the spread
 * of the group's first), and the expected information gain is the entropy of the groups'
 * probabilities in bits: the reduction of the candidates' entropy once the reading tells which group
 * holds the fault (the mutual information of a reading that resolves to its group). The largest
 * gain wins; ties go to the first probe, pin high first.
 */
public final class Diagnosis {

    /** Likelihood of a symptom the candidate does not explain. */
    public static final double SYMPTOM_MISMATCH = 0.02;
    /** The band about must-operate taken as chatter, percent. */
    public static final double CHATTER_BAND_PERCENT = 20;

    /**
     * How one reading compares with one candidate's expectation.
     *
     * @param probe the probe
     * @param pinHigh the pin state
     * @param expectedVolts what the candidate predicts
     * @param measuredVolts what was read
     * @param sigmaVolts the spread used
     */
    public record Explanation(String probe, boolean pinHigh, double expectedVolts, double measuredVolts,
                              double sigmaVolts) {
        /** The deviation in spreads. */
        public double zScore() {
            return (measuredVolts - expectedVolts) / sigmaVolts;
        }
    }

    /**
     * A ranked candidate.
     *
     * @param name {@code PART:KIND} or {@value Fault#NONE}
     * @param probability posterior probability
     * @param explains the readings against this candidate's expectations
     * @param symptomExplained whether the candidate shows the symptom entered (true with none)
     */
    public record Candidate(String name, double probability, List<Explanation> explains, boolean symptomExplained) {
    }

    /**
     * The proposed next measurement.
     *
     * @param probe the probe's name
     * @param pinHigh the pin state
     * @param gainBits expected information gain, bits
     */
    public record Next(String probe, boolean pinHigh, double gainBits) {
    }

    /**
     * The ranking and the next measurement.
     *
     * @param candidates by falling probability (solved entries only)
     * @param next the next measurement, empty when every probe is measured or nothing is left to split
     * @param unsolved faults left out because the faulted stage has no operating point
     */
    public record Result(List<Candidate> candidates, Optional<Next> next, List<String> unsolved) {
    }

    private Diagnosis() {
    }

    /**
     * Ranks the candidates.
     *
     * @param dictionary the dictionary of the stage
     * @param spread the spread of each reading
     * @param priors the prior weights
     * @param symptom what the relay does, if entered
     * @param readings the readings (probes must be those of the dictionary)
     * @return the ranking
     * @throws IllegalArgumentException for a probe the dictionary does not have
     */
    public static Result rank(FaultDictionary dictionary, Spread spread, Priors priors, Optional<Symptom> symptom,
                              List<Reading> readings) {
        List<FaultDictionary.Entry> entries = dictionary.entries();
        int[] index = new int[readings.size()];
        for (int r = 0; r < readings.size(); r++) {
            index[r] = dictionary.probeIndex(readings.get(r).probe());
            if (index[r] < 0) {
                throw new IllegalArgumentException("no probe point " + readings.get(r).probe());
            }
        }
        Meter meter = dictionary.meter();
        double mustOperate = dictionary.roles().flatMap(r -> dictionary.stage().part(r.relayRef()))
                .map(p -> p.value(ParamKeys.MUST_OPERATE_VOLTS)).orElse(Double.NaN);
        int coil = dictionary.probeIndex(Probe.COIL);
        List<double[]> logs = new ArrayList<>();
        List<FaultDictionary.Entry> solved = new ArrayList<>();
        List<String> unsolved = new ArrayList<>();
        List<List<Explanation>> explains = new ArrayList<>();
        List<Boolean> symptomOk = new ArrayList<>();
        double best = Double.NEGATIVE_INFINITY;
        for (FaultDictionary.Entry e : entries) {
            if (!e.solved()) {
                unsolved.add(e.name());
                continue;
            }
            double w = priors.weight(dictionary.stage(), e.fault());
            if (!(w > 0)) {
                continue;
            }
            double log = Math.log(w);
            List<Explanation> ex = new ArrayList<>();
            for (int r = 0; r < readings.size(); r++) {
                Reading rd = readings.get(r);
                double expected = e.state(rd.pinHigh()).volts()[index[r]];
                double sigma = spread.sigma(meter, expected);
                double z = (rd.volts() - expected) / sigma;
                log += -0.5 * z * z - Math.log(sigma);
                ex.add(new Explanation(rd.probe(), rd.pinHigh(), expected, rd.volts(), sigma));
            }
            boolean ok = symptom.map(s -> shows(e, s, coil, mustOperate)).orElse(true);
            if (!ok) {
                log += Math.log(SYMPTOM_MISMATCH);
            }
            solved.add(e);
            logs.add(new double[] {log});
            explains.add(ex);
            symptomOk.add(ok);
            best = Math.max(best, log);
        }
        double total = 0;
        double[] p = new double[solved.size()];
        for (int i = 0; i < p.length; i++) {
            p[i] = Math.exp(logs.get(i)[0] - best);
            total += p[i];
        }
        List<Candidate> candidates = new ArrayList<>();
        for (int i = 0; i < p.length; i++) {
            p[i] /= total;
            candidates.add(new Candidate(solved.get(i).name(), p[i], explains.get(i), symptomOk.get(i)));
        }
        Optional<Next> next = next(dictionary, spread, solved, p, readings);
        candidates.sort(Comparator.comparingDouble(Candidate::probability).reversed());
        return new Result(candidates, next, unsolved);
    }

    /** True when the entry shows the symptom. */
    static boolean shows(FaultDictionary.Entry e, Symptom s, int coil, double mustOperateVolts) {
        return switch (s) {
            case NO_OPERATE -> !e.high().operated();
            case NO_RELEASE -> e.low().operated();
            case CHATTER -> coil >= 0 && Double.isFinite(mustOperateVolts)
                    && Math.abs(Math.abs(e.high().volts()[coil]) - mustOperateVolts)
                    <= CHATTER_BAND_PERCENT / 100 * mustOperateVolts;
        };
    }

    private static Optional<Next> next(FaultDictionary d, Spread spread, List<FaultDictionary.Entry> entries,
                                       double[] p, List<Reading> readings) {
        Next best = null;
        for (boolean high : new boolean[] {true, false}) {
            for (int k = 0; k < d.probes().size(); k++) {
                String name = d.probes().get(k).name();
                boolean measured = false;
                for (Reading r : readings) {
                    measured |= r.probe().equals(name) && r.pinHigh() == high;
                }
                if (measured) {
                    continue;
                }
                double gain = gainBits(d.meter(), spread, entries, p, k, high);
                if (best == null || gain > best.gainBits() + 1e-12) {
                    best = new Next(name, high, gain);
                }
            }
        }
        return Optional.ofNullable(best);
    }

    /** The entropy, in bits, of the groups of candidates that one probe at one pin state tells apart. */
    static double gainBits(Meter meter, Spread spread, List<FaultDictionary.Entry> entries, double[] p, int probe,
                           boolean high) {
        Integer[] order = new Integer[entries.size()];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        double[] v = new double[entries.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = entries.get(i).state(high).volts()[probe];
        }
        java.util.Arrays.sort(order, Comparator.comparingDouble(i -> v[i]));
        double gain = 0;
        double groupMass = 0;
        double groupStart = Double.NaN;
        for (Integer i : order) {
            if (!Double.isNaN(groupStart) && v[i] - groupStart > 2 * spread.sigma(meter, groupStart)) {
                gain += entropyTerm(groupMass);
                groupMass = 0;
                groupStart = Double.NaN;
            }
            if (Double.isNaN(groupStart)) {
                groupStart = v[i];
            }
            groupMass += p[i];
        }
        gain += entropyTerm(groupMass);
        return gain;
    }

    private static double entropyTerm(double q) {
        return q > 0 ? -q * Math.log(q) / Math.log(2) : 0;
    }
}
