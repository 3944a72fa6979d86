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
        if (selector.matches("\\d+")) {
            int n = Integer.parseInt(selector);
            if (n < 1 || n > doc.stages().size()) {
                throw new CommandLine.ParameterException(cl, "--stage " + n + " is not in " + file.getFileName()
                        + ", which holds " + doc.stages().size() + " stage(s).");
            }
            return doc.stages().get(n - 1);
        }
        return doc.stages().stream().filter(s -> s.name().equals(selector)).findFirst()
                .orElseThrow(() -> new CommandLine.ParameterException(cl, "No stage of " + file.getFileName()
                        + " is named \"" + selector + "\"."));
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
            throw new CommandFailedException("Stage \"" + stage.name() + "\" cannot be " + verb + ": "
                    + String.join(" ", errors));
        }
        return stage;
    }
}
