package org.armature.cli;

import java.nio.file.Path;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import picocli.CommandLine;

/**
 * Picks one stage of a stage file by number (from 1) or name, for every command that reads a file,
 * and refuses a stage with validation errors.
 */
final class StageSelection {

    /** Validation errors quoted in a refusal; the rest are counted. */
    private static final int MAX_ERRORS_SHOWN = 3;

    private StageSelection() {
    }

    /**
     * @param doc the opened file
     * @param selector null for the first stage, a number from 1, or a stage name
     * @param file the file, for messages
     * @param cl the command line, for usage errors
     * @return the stage
     * @throws CommandLine.ParameterException if no stage matches
     */
    static Stage select(StageDocument doc, String selector, Path file, CommandLine cl) {
        if (selector == null) {
            return doc.first();
        }
        int count = doc.stages().size();
        String holds = ", which holds " + count + (count == 1 ? " stage" : " stages") + "; expected a number from 1 to "
                + count + " or a stage's name";
        if (selector.strip().matches("[+-]?\\d+")) {
            java.math.BigInteger n = new java.math.BigInteger(selector.strip());
            if (n.signum() < 1 || n.compareTo(java.math.BigInteger.valueOf(count)) > 0) {
                throw new CommandLine.ParameterException(cl, "--stage " + WholeNumbers.shortened(selector.strip())
                        + " is not in " + file.getFileName() + holds + ".");
            }
            return doc.stages().get(n.intValueExact() - 1);
        }
        return doc.stages().stream().filter(s -> s.name().equals(selector)).findFirst()
                .orElseThrow(() -> new CommandLine.ParameterException(cl, "No stage of " + file.getFileName()
                        + " is named \"" + org.armature.model.Validator.shorten(selector) + "\"" + holds + "."));
    }

    /**
     * Refuses a stage the validator finds errors in, before an engine sees it.
     *
     * @param stage the selected stage
     * @param verb what the command would do, for the message ("solved", "checked", "simulated")
     * @return the stage
     * @throws CommandFailedException naming every error
     */
    static Stage requireValid(Stage stage, String verb) {
        java.util.List<String> errors = org.armature.model.Validator.validate(stage).stream()
                .filter(f -> f.severity() == org.armature.model.Severity.ERROR)
                .map(org.armature.model.Finding::message).toList();
        if (!errors.isEmpty()) {
            java.util.List<String> shown = errors.subList(0, Math.min(errors.size(), MAX_ERRORS_SHOWN));
            String more = errors.size() > shown.size() ? " (and " + (errors.size() - shown.size()) + " more errors)" : "";
            throw new CommandFailedException("Stage \"" + org.armature.model.Validator.shorten(stage.name())
                    + "\" cannot be " + verb + ": " + String.join(" ", shown) + more);
        }
        return stage;
    }
}
