package org.armature.analysis;

import org.armature.model.Conditions;
import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;

/**
 * Template stages with their test inputs pinned: a 12 V rail at ±10 % and corners from −20 °C to
 * 60 °C. The expected figures in the analysis tests were derived for these inputs, so they must not
 * move when the templates' shipped defaults change.
 */
final class Fixtures {

    static final Conditions PINNED = new Conditions(true, 25, -20, 60);

    private Fixtures() {
    }

    static Stage build(StageTemplate t) {
        return pin(Templates.build(t));
    }

    static Stage build(StageTemplate t, Suppressor s, HighSideDrive d) {
        return pin(Templates.build(t, s, d));
    }

    static Stage pin(Stage s) {
        return s.updatePart("V1", p -> p.with("tolerancePercent", 10)).withConditions(PINNED);
    }
}
