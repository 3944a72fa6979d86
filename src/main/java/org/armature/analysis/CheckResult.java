package org.armature.analysis;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.armature.units.Unit;

/**
 * One verdict with its numbers.
 *
 * @param id stable check id (table in {@link StageChecks})
 * @param status pass, warn or fail
 * @param value the judged quantity at the worst variant, SI units of {@code unit}; NaN when no
 *     variant could be judged
 * @param limit the limit it is judged against (the pass limit, margin included), same unit
 * @param unit unit of value and limit
 * @param corner the worst variant's factor values by factor id, SI units (empty for the nominal
 *     stage or a static estimate)
 * @param cornerText the same in words ("supply 10.8 V, ambient 60.0 °C, ...")
 * @param method the formula or rule behind the check, and which engine gave the numbers
 * @param explanation one or two sentences with the numbers
 * @param refs the parts concerned
 */
public record CheckResult(String id, CheckStatus status, double value, double limit, Unit unit,
                          Map<String, Double> corner, String cornerText, String method, String explanation,
                          List<String> refs) {

    public CheckResult {
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("id must not be blank");
        }
        if (status == null || unit == null) {
            throw new IllegalArgumentException("status and unit must not be null for " + id);
        }
        corner = Collections.unmodifiableMap(new LinkedHashMap<>(corner));
        cornerText = cornerText == null ? "" : cornerText;
        method = method == null ? "" : method;
        explanation = explanation == null ? "" : explanation;
        refs = List.copyOf(refs);
    }
}
