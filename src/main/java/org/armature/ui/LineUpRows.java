package org.armature.ui;

import java.util.ArrayList;
import java.util.List;
import org.armature.analysis.LineUpMetrics;
import org.armature.analysis.LineUpMetrics.Column;
import org.armature.analysis.LineUpMetrics.Metric;

/**
 * Which rows of the line-up table are shown and in what order: one row per figure of
 * {@link LineUpMetrics#METRICS} (id = the metric's key) and one per check (id = {@code "check "} and
 * the check's id). Rows can be hidden and moved; the table and its tab-separated copy follow this
 * order. Plain state, no toolkit: the view keeps one across re-evaluations ({@link #merge}).
 */
final class LineUpRows {

    /** Prefix of a check row's id and label. */
    static final String CHECK = "check ";

    /**
     * One row.
     *
     * @param id the metric key or {@code "check <id>"}
     * @param label what the table shows in its first column
     * @param shown whether the row is in the table
     */
    record Row(String id, String label, boolean shown) {
    }

    private final List<Row> rows = new ArrayList<>();

    /** Every figure row, shown, in the order of {@link LineUpMetrics#METRICS}; checks come with {@link #merge}. */
    LineUpRows() {
        for (Metric m : LineUpMetrics.METRICS) {
            rows.add(new Row(m.key(), m.label(), true));
        }
    }

    /** Adds (shown, at the end) the check rows of these columns not listed yet; order and choices stay. */
    void merge(List<Column> columns) {
        for (String id : LineUpMetrics.checkIds(columns)) {
            if (rows.stream().noneMatch(r -> r.id().equals(CHECK + id))) {
                rows.add(new Row(CHECK + id, CHECK + id, true));
            }
        }
    }

    /** Every row in order, shown or not. */
    List<Row> rows() {
        return List.copyOf(rows);
    }

    /** The shown rows in order. */
    List<Row> shown() {
        return rows.stream().filter(Row::shown).toList();
    }

    /** Shows a hidden row or hides a shown one. */
    void toggle(int index) {
        Row r = rows.get(index);
        rows.set(index, new Row(r.id(), r.label(), !r.shown()));
    }

    /** Moves a row one place up (-1) or down (+1); returns its new index (the same at the ends). */
    int move(int index, int delta) {
        int j = index + delta;
        if (index < 0 || index >= rows.size() || j < 0 || j >= rows.size()) {
            return index;
        }
        rows.add(j, rows.remove(index));
        return j;
    }

    /**
     * The table as {@link LineUpMetrics#tabSeparated} writes it (the one formatter), with only the
     * shown rows, in this order, under its header line.
     */
    String tabSeparated(List<String> names, List<Column> columns) {
        List<String> lines = LineUpMetrics.tabSeparated(names, columns).lines().toList();
        List<String> ids = new ArrayList<>();
        LineUpMetrics.METRICS.forEach(m -> ids.add(m.key()));
        LineUpMetrics.checkIds(columns).forEach(id -> ids.add(CHECK + id));
        StringBuilder b = new StringBuilder(lines.get(0)).append('\n');
        for (Row r : shown()) {
            int i = ids.indexOf(r.id());
            if (i >= 0) {
                b.append(lines.get(i + 1)).append('\n');
            }
        }
        return b.toString();
    }
}
