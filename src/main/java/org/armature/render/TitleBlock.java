package org.armature.render;

/**
 * What the title block of an exported sheet says: which stage, from which document, when, and under
 * which conditions its readouts were solved.
 *
 * @param stageName the stage's name
 * @param documentTitle the stage file's title (may be empty)
 * @param date the date of the export, as written (ISO 8601, {@code 2026-12-05})
 * @param conditions the conditions of the readouts in words ("pin high · ambient 30 °C · coil supply
 *     12 V ±5 % · nominal values")
 */
public record TitleBlock(String stageName, String documentTitle, String date, String conditions) {

    public TitleBlock {
        if (stageName == null || documentTitle == null || date == null || conditions == null) {
            throw new IllegalArgumentException("title block texts must not be null (use empty text)");
        }
    }
}
