package org.armature.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.stream.Collectors;
import org.armature.analysis.faults.FaultKind;
import org.armature.analysis.faults.Symptom;
import org.armature.model.Conditions;
import org.armature.model.FaultHunt;
import org.armature.model.GridPoint;
import org.armature.model.LineUp;
import org.armature.model.LineUpContext;
import org.armature.model.SharedPart;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Placement;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageSettings;
import org.armature.model.TestPoint;
import org.armature.model.Wire;

/**
 * Maps a parsed JSON tree onto the document records, field by field, with the JSON path of every
 * problem in its message ({@code stages[0].parts[3].at}).
 */
final class StageReader {

    private static final Set<String> TOP_FIELDS =
            Set.of("format", "version", "title", "stages", "lineUp", "faultHunt");
    private static final Set<String> HUNT_FIELDS = Set.of("stage", "symptom", "meter", "readings", "priorWeights");
    private static final Set<String> METER_FIELDS = Set.of("inputOhms", "counts", "percentOfReading", "digits");
    private static final Set<String> READING_FIELDS = Set.of("net", "pinState", "volts");
    private static final Set<String> LINE_UP_FIELDS = Set.of("stages", "context");
    private static final Set<String> CONTEXT_FIELDS =
            Set.of("ambient", "relay", "coilSupply", "drivePin", "contactSupply", "load");
    private static final Set<String> AMBIENT_FIELDS = Set.of("ambientCelsius", "ambientMinCelsius", "ambientMaxCelsius");
    private static final Set<String> SHARED_PART_FIELDS = Set.of("kind", "values", "options");
    /** The kind each shared role must hold. */
    private static final Map<String, PartKind> SHARED_ROLE_KINDS = Map.of("relay", PartKind.RELAY,
            "coilSupply", PartKind.SUPPLY, "drivePin", PartKind.DRIVE_PIN, "contactSupply", PartKind.SUPPLY,
            "load", PartKind.LOAD);
    private static final Set<String> STAGE_FIELDS =
            Set.of("name", "description", "conditions", "settings", "parts", "wires", "testPoints");
    private static final Set<String> SETTINGS_FIELDS =
            Set.of("releaseTimeSeconds", "monteCarloSamples", "monteCarloSeed");
    private static final Set<String> CONDITION_FIELDS =
            Set.of("pinState", "ambientCelsius", "ambientMinCelsius", "ambientMaxCelsius");
    private static final Set<String> PART_FIELDS =
            Set.of("ref", "kind", "at", "rotation", "mirrored", "values", "options");
    private static final Set<String> TEST_POINT_FIELDS = Set.of("net", "ref", "pin");

    /** Number of integers in a wire: x1, y1, x2, y2. */
    private static final int WIRE_COORDINATES = 4;
    /** Rotations are whole quarter turns. */
    private static final int QUARTER_TURN_DEGREES = 90;
    /** Absolute zero in degrees Celsius. */
    private static final double ABSOLUTE_ZERO_CELSIUS = -273.15;
    /** Fewest display counts of a meter ({@link FaultHunt.MeterSetting}). */
    private static final int MIN_METER_COUNTS = 10;
    /** Longest excerpt of a wrong value quoted in a message. */
    private static final int EXCERPT_CHARS = 40;

    private StageReader() {
    }

    static StageDocument read(JsonNode root) {
        if (!root.isObject()) {
            throw new StageFileException(StageFileException.WRONG_TYPE,
                    "A stage file holds one JSON object at the top level, not " + describe(root) + ".");
        }
        JsonNode format = root.get("format");
        if (format == null || !format.isTextual() || !format.textValue().equals(StageJson.FORMAT)) {
            String expected = "\"" + StageJson.FORMAT + "\"";
            String found = format == null ? "it has no \"format\": " + expected + " entry"
                    : "its \"format\" is " + format + ", not " + expected;
            throw new StageFileException(StageFileException.UNKNOWN_FORMAT,
                    "This is not an Armature stage file: " + found + ".");
        }
        int version = readVersion(root.get("version"));
        checkFields(root, TOP_FIELDS, "The file");
        if (root.has("lineUp") && version < StageJson.VERSION_WITH_LINE_UP) {
            throw new StageFileException(StageFileException.UNKNOWN_FIELD, "The file has a field \"lineUp\", which "
                    + "stage files hold from version " + StageJson.VERSION_WITH_LINE_UP + "; this one says version "
                    + version + ".");
        }
        if (root.has("faultHunt") && version < StageJson.VERSION) {
            throw new StageFileException(StageFileException.UNKNOWN_FIELD, "The file has a field \"faultHunt\", which "
                    + "stage files hold from version " + StageJson.VERSION + "; this one says version " + version + ".");
        }
        String title = optionalText(root, "title", "title", "");
        JsonNode stagesNode = required(root, "stages", "The file");
        expectArray(stagesNode, "stages");
        if (stagesNode.isEmpty()) {
            throw new StageFileException(StageFileException.INVALID_VALUE,
                    "stages is empty; a stage file holds at least one stage.");
        }
        List<Stage> stages = new ArrayList<>();
        for (int i = 0; i < stagesNode.size(); i++) {
            stages.add(readStage(stagesNode.get(i), "stages[" + i + "]"));
        }
        Optional<LineUp> lineUp = root.has("lineUp")
                ? Optional.of(readLineUp(root.get("lineUp"), "lineUp", stages.size()))
                : Optional.empty();
        Optional<FaultHunt> hunt = root.has("faultHunt")
                ? Optional.of(readFaultHunt(root.get("faultHunt"), "faultHunt", stages.size()))
                : Optional.empty();
        return new StageDocument(title, stages, lineUp, hunt);
    }

    /**
     * The document's fault hunt (format version 4). Numbers and words are checked here, since the
     * document cannot hold a meter of negative counts or a reading that is not a number; the names
     * of the readings' nets are not, because they follow the drawing (a net renamed after the hunt
     * is reported where the hunt is ranked).
     */
    private static FaultHunt readFaultHunt(JsonNode node, String path, int stageCount) {
        expectObject(node, path);
        checkFields(node, HUNT_FIELDS, path);
        JsonNode stageNode = required(node, "stage", path);
        if (!isInt(stageNode)) {
            throw new StageFileException(StageFileException.WRONG_TYPE, path + ".stage must be a whole number "
                    + "(the hunted stage's index from 0), not " + describe(stageNode) + ".");
        }
        int stage = stageNode.intValue();
        if (stage < 0 || stage >= stageCount) {
            throw new StageFileException(StageFileException.INVALID_VALUE, path + ".stage is " + stage
                    + "; expected the index of one of the file's " + stageCount + " stages, from 0 to "
                    + (stageCount - 1) + ".");
        }
        Optional<String> symptom = Optional.empty();
        if (node.has("symptom")) {
            String word = text(node.get("symptom"), path + ".symptom");
            if (Symptom.byId(word).isEmpty()) {
                throw new StageFileException(StageFileException.INVALID_VALUE, path + ".symptom is \""
                        + StageJson.excerpt(word) + "\"; expected one of " + symptomWords() + ".");
            }
            symptom = Optional.of(word);
        }
        FaultHunt.MeterSetting meter = node.has("meter")
                ? readMeter(node.get("meter"), path + ".meter")
                : FaultHunt.MeterSetting.DEFAULT;
        List<FaultHunt.HuntReading> readings = new ArrayList<>();
        if (node.has("readings")) {
            JsonNode list = node.get("readings");
            expectArray(list, path + ".readings");
            for (int i = 0; i < list.size(); i++) {
                readings.add(readHuntReading(list.get(i), path + ".readings[" + i + "]"));
            }
        }
        Map<String, Double> weights = new LinkedHashMap<>();
        if (node.has("priorWeights")) {
            JsonNode w = node.get("priorWeights");
            String wpath = path + ".priorWeights";
            expectObject(w, wpath);
            for (Map.Entry<String, JsonNode> e : w.properties()) {
                String kind = e.getKey();
                if (!kind.equals(FaultHunt.NONE) && FaultKind.byId(kind).isEmpty()) {
                    throw new StageFileException(StageFileException.INVALID_VALUE, wpath + " weighs \""
                            + StageJson.excerpt(kind) + "\", which is not a fault kind; expected " + FaultHunt.NONE
                            + " (the healthy stage) or one of " + kindWords() + ".");
                }
                String kpath = wpath + "." + kind;
                double weight = number(e.getValue(), kpath);
                if (!(weight >= 0) || Double.isInfinite(weight)) {
                    throw new StageFileException(StageFileException.INVALID_VALUE, kpath
                            + " must be a finite weight not below 0 (the default weights are about 0.1 to 10), not "
                            + describe(e.getValue()) + ".");
                }
                weights.put(kind, weight);
            }
        }
        return new FaultHunt(stage, symptom, meter, readings, weights);
    }

    private static FaultHunt.MeterSetting readMeter(JsonNode node, String path) {
        expectObject(node, path);
        checkFields(node, METER_FIELDS, path);
        FaultHunt.MeterSetting d = FaultHunt.MeterSetting.DEFAULT;
        double ohms = optionalNumber(node, "inputOhms", path, d.inputOhms());
        if (!(ohms > 0) || Double.isInfinite(ohms)) {
            throw new StageFileException(StageFileException.INVALID_VALUE, path + ".inputOhms must be a positive, "
                    + "finite resistance in ohms (10000000 for a 10 MΩ meter), not " + describe(node.get("inputOhms"))
                    + ".");
        }
        int counts = d.counts();
        if (node.has("counts")) {
            JsonNode c = node.get("counts");
            if (!isInt(c) || c.intValue() < MIN_METER_COUNTS) {
                throw new StageFileException(isInt(c) ? StageFileException.INVALID_VALUE : StageFileException.WRONG_TYPE,
                        path + ".counts must be a whole number of display counts, at least " + MIN_METER_COUNTS
                                + " (4000 for a 4,000-count meter), not " + describe(c) + ".");
            }
            counts = c.intValue();
        }
        double percent = optionalNumber(node, "percentOfReading", path, d.percentOfReading());
        double digits = optionalNumber(node, "digits", path, d.digits());
        for (String field : List.of("percentOfReading", "digits")) {
            double v = field.equals("digits") ? digits : percent;
            if (!(v >= 0) || Double.isInfinite(v)) {
                throw new StageFileException(StageFileException.INVALID_VALUE, path + "." + field
                        + " must be a finite number not below 0 (the accuracy ±(1 % + 2 digits) is 1 and 2), not "
                        + describe(node.get(field)) + ".");
            }
        }
        return new FaultHunt.MeterSetting(ohms, counts, percent, digits);
    }

    private static FaultHunt.HuntReading readHuntReading(JsonNode node, String path) {
        expectObject(node, path);
        checkFields(node, READING_FIELDS, path);
        String net = requiredText(node, "net", path);
        if (net.isBlank()) {
            throw new StageFileException(StageFileException.INVALID_VALUE,
                    path + ".net is blank; expected the probe point's net name as solve prints it, or coil.");
        }
        String state = requiredText(node, "pinState", path);
        if (!state.equals("high") && !state.equals("low")) {
            throw new StageFileException(StageFileException.INVALID_VALUE,
                    path + ".pinState is \"" + StageJson.excerpt(state) + "\"; it must be \"high\" or \"low\".");
        }
        JsonNode v = required(node, "volts", path);
        double volts = number(v, path + ".volts");
        if (!Double.isFinite(volts)) {
            throw new StageFileException(StageFileException.INVALID_VALUE,
                    path + ".volts must be a finite number of volts as the meter showed it, not " + describe(v) + ".");
        }
        return new FaultHunt.HuntReading(net, state.equals("high"), volts);
    }

    private static String symptomWords() {
        return Arrays.stream(Symptom.values()).map(Symptom::id).collect(Collectors.joining(", "));
    }

    private static String kindWords() {
        return Arrays.stream(FaultKind.values()).map(FaultKind::id).collect(Collectors.joining(", "));
    }

    /** The document's line-up (format version 3). */
    private static LineUp readLineUp(JsonNode node, String path, int stageCount) {
        expectObject(node, path);
        checkFields(node, LINE_UP_FIELDS, path);
        JsonNode list = required(node, "stages", path);
        expectArray(list, path + ".stages");
        if (list.size() < LineUp.MIN_STAGES || list.size() > LineUp.MAX_STAGES) {
            throw new StageFileException(StageFileException.INVALID_VALUE, path + ".stages holds " + list.size()
                    + " stages; a line-up holds " + LineUp.MIN_STAGES + " to " + LineUp.MAX_STAGES + ".");
        }
        List<Integer> indices = new ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            JsonNode n = list.get(i);
            String where = path + ".stages[" + i + "]";
            if (!isInt(n)) {
                throw new StageFileException(StageFileException.WRONG_TYPE,
                        where + " must be a whole number (a stage's index from 0), not " + describe(n) + ".");
            }
            int index = n.intValue();
            if (index < 0 || index >= stageCount || indices.contains(index)) {
                throw new StageFileException(StageFileException.INVALID_VALUE, where + " is " + index
                        + "; expected the index of another of the file's " + stageCount + " stages, from 0 to "
                        + (stageCount - 1) + ".");
            }
            indices.add(index);
        }
        JsonNode ctx = required(node, "context", path);
        String cpath = path + ".context";
        expectObject(ctx, cpath);
        checkFields(ctx, CONTEXT_FIELDS, cpath);
        Conditions d = Conditions.DEFAULT;
        double ambient = d.ambientCelsius();
        double min = d.ambientMinCelsius();
        double max = d.ambientMaxCelsius();
        if (ctx.has("ambient")) {
            JsonNode a = ctx.get("ambient");
            String apath = cpath + ".ambient";
            expectObject(a, apath);
            checkFields(a, AMBIENT_FIELDS, apath);
            ambient = optionalNumber(a, "ambientCelsius", apath, ambient);
            min = optionalNumber(a, "ambientMinCelsius", apath, min);
            max = optionalNumber(a, "ambientMaxCelsius", apath, max);
            if (!Double.isFinite(ambient) || ambient < ABSOLUTE_ZERO_CELSIUS) {
                throw new StageFileException(StageFileException.INVALID_VALUE,
                        apath + ".ambientCelsius must be a finite temperature above absolute zero (−273.15 °C).");
            }
            if (!(min <= max)) {
                throw new StageFileException(StageFileException.INVALID_VALUE,
                        apath + ".ambientMinCelsius (" + min + ") must not exceed ambientMaxCelsius (" + max + ").");
            }
        }
        LineUpContext context = new LineUpContext(shared(ctx, "relay", cpath), shared(ctx, "coilSupply", cpath),
                shared(ctx, "drivePin", cpath), shared(ctx, "contactSupply", cpath), shared(ctx, "load", cpath),
                ambient, min, max);
        return new LineUp(indices, context);
    }

    /** One shared role: a kind, values and options, as a part has them. */
    private static Optional<SharedPart> shared(JsonNode ctx, String role, String cpath) {
        if (!ctx.has(role)) {
            return Optional.empty();
        }
        JsonNode node = ctx.get(role);
        String where = cpath + "." + role;
        expectObject(node, where);
        checkFields(node, SHARED_PART_FIELDS, where);
        String kindId = requiredText(node, "kind", where);
        PartKind expected = SHARED_ROLE_KINDS.get(role);
        PartKind kind = PartKindIds.byId(kindId).orElseThrow(() -> new StageFileException(
                StageFileException.UNKNOWN_KIND,
                where + " has kind \"" + StageJson.excerpt(kindId) + "\", which is not a part kind; expected \""
                        + PartKindIds.id(expected) + "\"."));
        if (kind != expected) {
            throw new StageFileException(StageFileException.INVALID_VALUE, where + " has kind \"" + kindId
                    + "\"; the shared " + role + " must be \"" + PartKindIds.id(expected) + "\".");
        }
        return Optional.of(new SharedPart(kind, values(node, where), options(node, where)));
    }

    private static Map<String, Double> values(JsonNode node, String where) {
        Map<String, Double> values = new LinkedHashMap<>();
        if (node.has("values")) {
            JsonNode v = node.get("values");
            expectObject(v, where + ".values");
            for (Map.Entry<String, JsonNode> e : v.properties()) {
                values.put(e.getKey(), number(e.getValue(), where + ".values." + StageJson.excerpt(e.getKey())));
            }
        }
        return values;
    }

    private static Map<String, String> options(JsonNode node, String where) {
        Map<String, String> options = new LinkedHashMap<>();
        if (node.has("options")) {
            JsonNode o = node.get("options");
            expectObject(o, where + ".options");
            for (Map.Entry<String, JsonNode> e : o.properties()) {
                options.put(e.getKey(), text(e.getValue(), where + ".options." + StageJson.excerpt(e.getKey())));
            }
        }
        return options;
    }

    private static int readVersion(JsonNode version) {
        if (version == null) {
            throw new StageFileException(StageFileException.MISSING_FIELD,
                    "The file has no \"version\" field; stage files of this program are version "
                            + StageJson.VERSION + ".");
        }
        if (!version.isIntegralNumber() || !version.canConvertToInt() || version.intValue() < 1) {
            throw new StageFileException(StageFileException.UNKNOWN_VERSION,
                    "The file's \"version\" is " + version + ", which is not a stage file version; this program reads versions "
                            + StageJson.VERSION_WITHOUT_SETTINGS + " to " + StageJson.VERSION + ".");
        }
        if (version.intValue() > StageJson.VERSION) {
            throw new StageFileException(StageFileException.NEWER_VERSION,
                    "The file was written by a newer Armature (stage file version " + version.intValue()
                            + "); this program reads up to version " + StageJson.VERSION + ".");
        }
        return version.intValue();
    }

    private static Stage readStage(JsonNode node, String path) {
        expectObject(node, path);
        checkFields(node, STAGE_FIELDS, path);
        String name = requiredText(node, "name", path);
        String description = optionalText(node, "description", path + ".description", "");
        Conditions conditions = node.has("conditions")
                ? readConditions(node.get("conditions"), path + ".conditions")
                : Conditions.DEFAULT;
        StageSettings settings = node.has("settings")
                ? readSettings(node.get("settings"), path + ".settings")
                : StageSettings.DEFAULT;
        JsonNode partsNode = required(node, "parts", path);
        expectArray(partsNode, path + ".parts");
        List<Part> parts = new ArrayList<>();
        for (int i = 0; i < partsNode.size(); i++) {
            parts.add(readPart(partsNode.get(i), path + ".parts[" + i + "]"));
        }
        List<Wire> wires = new ArrayList<>();
        if (node.has("wires")) {
            JsonNode wiresNode = node.get("wires");
            expectArray(wiresNode, path + ".wires");
            for (int i = 0; i < wiresNode.size(); i++) {
                wires.add(readWire(wiresNode.get(i), path + ".wires[" + i + "]"));
            }
        }
        List<TestPoint> testPoints = new ArrayList<>();
        if (node.has("testPoints")) {
            JsonNode tpNode = node.get("testPoints");
            expectArray(tpNode, path + ".testPoints");
            for (int i = 0; i < tpNode.size(); i++) {
                testPoints.add(readTestPoint(tpNode.get(i), path + ".testPoints[" + i + "]"));
            }
        }
        return new Stage(name, description, parts, wires, testPoints, conditions, settings);
    }

    /** The stage's own check settings (format version 2). */
    private static StageSettings readSettings(JsonNode node, String path) {
        expectObject(node, path);
        checkFields(node, SETTINGS_FIELDS, path);
        StageSettings d = StageSettings.DEFAULT;
        OptionalDouble release = d.releaseTimeRequirementSeconds();
        if (node.has("releaseTimeSeconds")) {
            double t = number(node.get("releaseTimeSeconds"), path + ".releaseTimeSeconds");
            if (!(t > 0) || !Double.isFinite(t)) {
                throw new StageFileException(StageFileException.INVALID_VALUE,
                        path + ".releaseTimeSeconds must be a positive time in seconds (for example 0.01).");
            }
            release = OptionalDouble.of(t);
        }
        int samples = d.monteCarloSamples();
        if (node.has("monteCarloSamples")) {
            JsonNode n = node.get("monteCarloSamples");
            if (!isInt(n) || n.intValue() < 0 || n.intValue() > StageSettings.MAX_MONTE_CARLO_SAMPLES) {
                throw new StageFileException(isInt(n) ? StageFileException.INVALID_VALUE : StageFileException.WRONG_TYPE,
                        path + ".monteCarloSamples must be a whole number from 0 to "
                                + StageSettings.MAX_MONTE_CARLO_SAMPLES + ", not " + describe(n) + ".");
            }
            samples = n.intValue();
        }
        long seed = d.monteCarloSeed();
        if (node.has("monteCarloSeed")) {
            JsonNode n = node.get("monteCarloSeed");
            if (!n.isIntegralNumber() || !n.canConvertToLong()) {
                throw new StageFileException(StageFileException.WRONG_TYPE,
                        path + ".monteCarloSeed must be a whole number, not " + describe(n) + ".");
            }
            seed = n.longValue();
        }
        return new StageSettings(release, samples, seed);
    }

    private static Conditions readConditions(JsonNode node, String path) {
        expectObject(node, path);
        checkFields(node, CONDITION_FIELDS, path);
        Conditions d = Conditions.DEFAULT;
        boolean pinHigh = d.pinHigh();
        if (node.has("pinState")) {
            String state = text(node.get("pinState"), path + ".pinState");
            if (state.equals("high") || state.equals("low")) {
                pinHigh = state.equals("high");
            } else {
                throw new StageFileException(StageFileException.INVALID_VALUE,
                        path + ".pinState is \"" + StageJson.excerpt(state) + "\"; it must be \"high\" or \"low\".");
            }
        }
        double ambient = optionalNumber(node, "ambientCelsius", path, d.ambientCelsius());
        double min = optionalNumber(node, "ambientMinCelsius", path, d.ambientMinCelsius());
        double max = optionalNumber(node, "ambientMaxCelsius", path, d.ambientMaxCelsius());
        if (!Double.isFinite(ambient) || ambient < ABSOLUTE_ZERO_CELSIUS) {
            throw new StageFileException(StageFileException.INVALID_VALUE,
                    path + ".ambientCelsius must be a finite temperature above absolute zero (−273.15 °C).");
        }
        if (!(min <= max)) {
            throw new StageFileException(StageFileException.INVALID_VALUE,
                    path + ".ambientMinCelsius (" + min + ") must not exceed ambientMaxCelsius (" + max + ").");
        }
        return new Conditions(pinHigh, ambient, min, max);
    }

    private static Part readPart(JsonNode node, String path) {
        expectObject(node, path);
        String ref = requiredText(node, "ref", path);
        if (ref.isBlank()) {
            throw new StageFileException(StageFileException.INVALID_VALUE, path + ".ref must not be blank.");
        }
        String where = path + " (" + StageJson.excerpt(ref) + ")";
        checkFields(node, PART_FIELDS, where);
        String kindId = requiredText(node, "kind", where);
        PartKind kind = PartKindIds.byId(kindId).orElseThrow(() -> new StageFileException(
                StageFileException.UNKNOWN_KIND,
                where + " has kind \"" + StageJson.excerpt(kindId) + "\", which is not a part kind; the kinds are "
                        + String.join(", ", PartKindIds.all()) + "."));
        JsonNode at = required(node, "at", where);
        if (!at.isArray() || at.size() != 2 || !isInt(at.get(0)) || !isInt(at.get(1))) {
            throw new StageFileException(StageFileException.WRONG_TYPE,
                    where + ".at must be two whole numbers [x, y] (grid units), not " + describe(at) + ".");
        }
        int rotation = 0;
        if (node.has("rotation")) {
            JsonNode r = node.get("rotation");
            if (!isInt(r)) {
                throw new StageFileException(StageFileException.WRONG_TYPE,
                        where + ".rotation must be a whole number of degrees, not " + describe(r) + ".");
            }
            rotation = r.intValue();
            if (rotation % QUARTER_TURN_DEGREES != 0) {
                throw new StageFileException(StageFileException.INVALID_VALUE,
                        where + ".rotation is " + rotation + "; it must be 0, 90, 180 or 270 (degrees clockwise).");
            }
        }
        boolean mirrored = false;
        if (node.has("mirrored")) {
            JsonNode m = node.get("mirrored");
            if (!m.isBoolean()) {
                throw new StageFileException(StageFileException.WRONG_TYPE,
                        where + ".mirrored must be true or false, not " + describe(m) + ".");
            }
            mirrored = m.booleanValue();
        }
        Map<String, Double> values = values(node, where);
        Map<String, String> options = options(node, where);
        Placement placement = new Placement(new GridPoint(at.get(0).intValue(), at.get(1).intValue()),
                rotation, mirrored);
        return new Part(ref, kind, values, options, placement);
    }

    private static Wire readWire(JsonNode node, String path) {
        boolean ok = node.isArray() && node.size() == WIRE_COORDINATES;
        for (int i = 0; ok && i < WIRE_COORDINATES; i++) {
            ok = isInt(node.get(i));
        }
        if (!ok) {
            throw new StageFileException(StageFileException.WRONG_TYPE,
                    path + " must be four whole numbers [x1, y1, x2, y2] (grid units), not " + describe(node) + ".");
        }
        int x1 = node.get(0).intValue();
        int y1 = node.get(1).intValue();
        int x2 = node.get(2).intValue();
        int y2 = node.get(3).intValue();
        if (x1 != x2 && y1 != y2) {
            throw new StageFileException(StageFileException.INVALID_VALUE,
                    path + " runs diagonally from (" + x1 + ", " + y1 + ") to (" + x2 + ", " + y2
                            + "); wires must be horizontal or vertical.");
        }
        return Wire.of(x1, y1, x2, y2);
    }

    private static TestPoint readTestPoint(JsonNode node, String path) {
        expectObject(node, path);
        checkFields(node, TEST_POINT_FIELDS, path);
        String net = requiredText(node, "net", path);
        String ref = requiredText(node, "ref", path);
        String pin = requiredText(node, "pin", path);
        if (!net.matches("[A-Za-z][A-Za-z0-9_\\-]*")) {
            throw new StageFileException(StageFileException.INVALID_VALUE,
                    path + ".net is \"" + StageJson.excerpt(net) + "\"; a net name starts with a letter and uses letters, digits, _ or -.");
        }
        return new TestPoint(net, ref, pin);
    }

    private static void checkFields(JsonNode obj, Set<String> allowed, String where) {
        for (Map.Entry<String, JsonNode> e : obj.properties()) {
            String name = e.getKey();
            if (!allowed.contains(name)) {
                throw new StageFileException(StageFileException.UNKNOWN_FIELD,
                        where + " has a field \"" + StageJson.excerpt(name) + "\" that stage files do not define; the fields are "
                                + String.join(", ", allowed.stream().sorted().toList()) + ".");
            }
        }
    }

    private static JsonNode required(JsonNode obj, String field, String where) {
        JsonNode v = obj.get(field);
        if (v == null) {
            throw new StageFileException(StageFileException.MISSING_FIELD, where + " has no \"" + field + "\".");
        }
        return v;
    }

    private static String requiredText(JsonNode obj, String field, String where) {
        return text(required(obj, field, where), where + "." + field);
    }

    private static String optionalText(JsonNode obj, String field, String fieldPath, String fallback) {
        JsonNode v = obj.get(field);
        return v == null ? fallback : text(v, fieldPath);
    }

    private static double optionalNumber(JsonNode obj, String field, String path, double fallback) {
        JsonNode v = obj.get(field);
        return v == null ? fallback : number(v, path + "." + field);
    }

    private static String text(JsonNode v, String path) {
        if (!v.isTextual()) {
            throw new StageFileException(StageFileException.WRONG_TYPE,
                    path + " must be text, not " + describe(v) + ".");
        }
        return v.textValue();
    }

    /** A number, or one of the texts "NaN", "Infinity", "-Infinity" that JSON cannot write as numbers. */
    private static double number(JsonNode v, String path) {
        if (v.isNumber()) {
            return v.doubleValue();
        }
        if (v.isTextual()) {
            switch (v.textValue()) {
                case StageWriter.NOT_A_NUMBER:
                    return Double.NaN;
                case StageWriter.POSITIVE_INFINITY:
                    return Double.POSITIVE_INFINITY;
                case StageWriter.NEGATIVE_INFINITY:
                    return Double.NEGATIVE_INFINITY;
                default:
                    break;
            }
        }
        throw new StageFileException(StageFileException.WRONG_TYPE,
                path + " must be a number (SI units, as the key says), not " + describe(v) + ".");
    }

    private static boolean isInt(JsonNode v) {
        return v != null && v.isIntegralNumber() && v.canConvertToInt();
    }

    private static void expectObject(JsonNode v, String path) {
        if (!v.isObject()) {
            throw new StageFileException(StageFileException.WRONG_TYPE,
                    path + " must be an object {...}, not " + describe(v) + ".");
        }
    }

    private static void expectArray(JsonNode v, String path) {
        if (!v.isArray()) {
            throw new StageFileException(StageFileException.WRONG_TYPE,
                    path + " must be a list [...], not " + describe(v) + ".");
        }
    }

    /** Plain words for what a node is, with a short excerpt of it. */
    private static String describe(JsonNode v) {
        String excerpt = v.toString();
        if (excerpt.length() > EXCERPT_CHARS) {
            excerpt = excerpt.substring(0, EXCERPT_CHARS) + "…";
        }
        if (v.isTextual()) {
            return "the text " + excerpt;
        }
        if (v.isNumber()) {
            return "the number " + excerpt;
        }
        if (v.isBoolean()) {
            return excerpt;
        }
        if (v.isNull()) {
            return "null";
        }
        if (v.isArray()) {
            return "the list " + excerpt;
        }
        return "the object " + excerpt;
    }
}
