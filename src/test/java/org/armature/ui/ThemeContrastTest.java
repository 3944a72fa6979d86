package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.armature.render.Colour;
import org.armature.render.Palette;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Text contrast of both themes, computed from the stylesheets themselves and from the drawing's
 * palette: every text colour against every surface it can sit on must reach 4.5:1, the WCAG 2.x
 * minimum for normal text (W3C, Web Content Accessibility Guidelines 2.1, success criterion 1.4.3,
 * with the relative luminance and contrast ratio of its definitions). Selected and hovered rows are
 * surfaces too. Failed before the fix (issue 17): the dark theme's error colour read 1.5:1 on a
 * selected row, and the light theme's warning brown 3.1:1 on a hovered one.
 */
class ThemeContrastTest {

    /** WCAG 2.x, SC 1.4.3 (AA) minimum contrast for normal text. */
    static final double MIN_TEXT = 4.5;

    private static final Pattern VARIABLE = Pattern.compile("(-[a-z][\\w-]*)\\s*:\\s*(#[0-9a-fA-F]{6})\\b");
    private static final Pattern RULE = Pattern.compile("([^{}]+)\\{([^}]*)}");
    private static final Pattern PROPERTY = Pattern.compile("(-fx-[\\w-]+)\\s*:\\s*([^;]+);");

    static String read(String name) throws IOException {
        try (InputStream in = ThemeContrastTest.class.getResourceAsStream("/org/armature/assets/css/" + name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    /** Relative luminance, WCAG 2.x definition (sRGB, linearised). */
    static double luminance(int rgb) {
        double r = channel((rgb >> 16) & 0xff);
        double g = channel((rgb >> 8) & 0xff);
        double b = channel(rgb & 0xff);
        return 0.2126 * r + 0.7152 * g + 0.0722 * b;
    }

    private static double channel(int c) {
        double s = c / 255.0;
        return s <= 0.04045 ? s / 12.92 : Math.pow((s + 0.055) / 1.055, 2.4);
    }

    static double contrast(int a, int b) {
        double la = luminance(a);
        double lb = luminance(b);
        return (Math.max(la, lb) + 0.05) / (Math.min(la, lb) + 0.05);
    }

    private static int rgb(Colour c) {
        return c.red() << 16 | c.green() << 8 | c.blue();
    }

    /** The value of the last variable in a property value ("-arm-accent-edge, -arm-accent" gives -arm-accent). */
    private static String lastVariable(String value) {
        String[] parts = value.split(",");
        return parts[parts.length - 1].trim().split("\\s+")[0];
    }

    @ParameterizedTest(name = "{0} theme")
    @ValueSource(strings = {"light", "dark"})
    void everyTextPairOfTheStylesheets(String theme) throws IOException {
        Map<String, Integer> vars = new LinkedHashMap<>();
        Matcher m = VARIABLE.matcher(read(theme + ".css"));
        while (m.find()) {
            vars.put(m.group(1), Integer.parseInt(m.group(2).substring(1), 16));
        }
        // surfaces any text may sit on: the theme's backgrounds, selected and hovered rows, and every
        // background a rule of base.css paints without its own text colour
        Set<String> surfaces = new LinkedHashSet<>(List.of("-arm-paper", "-arm-panel", "-fx-background",
                "-fx-control-inner-background", "-fx-base", "-arm-selected", "-arm-hover"));
        Set<String> texts = new LinkedHashSet<>(List.of("-arm-ink"));
        List<String[]> ownPairs = new ArrayList<>();
        String base = read("base.css").replaceAll("/\\*.*?\\*/", "");
        // a rule's descendants ("x:selected .icon") sit on the fill of that rule ("x:selected")
        Map<String, String> fillOf = new LinkedHashMap<>();
        Matcher f = RULE.matcher(base);
        while (f.find()) {
            Matcher p = PROPERTY.matcher(f.group(2));
            while (p.find()) {
                if (p.group(1).equals("-fx-background-color")) {
                    for (String sel : f.group(1).split(",")) {
                        fillOf.put(sel.trim(), p.group(2).trim());
                    }
                }
            }
        }
        Matcher r = RULE.matcher(base);
        while (r.find()) {
            Map<String, String> props = new LinkedHashMap<>();
            Matcher p = PROPERTY.matcher(r.group(2));
            while (p.find()) {
                props.put(p.group(1), p.group(2).trim());
            }
            String text = props.containsKey("-fx-text-fill") ? props.get("-fx-text-fill")
                    : props.get("-fx-icon-color");
            String fill = props.get("-fx-background-color");
            if (fill == null) {
                String head = r.group(1).split(",")[0].trim().split("\\s+")[0];
                fill = head.equals(r.group(1).split(",")[0].trim()) ? null : fillOf.get(head);
            }
            if (text != null && fill != null && vars.containsKey(lastVariable(fill))) {
                ownPairs.add(new String[] {r.group(1).trim(), text, lastVariable(fill)});
            } else {
                if (text != null && vars.containsKey(text)) {
                    texts.add(text);
                }
                if (fill != null && vars.containsKey(lastVariable(fill))) {
                    surfaces.add(lastVariable(fill));
                }
            }
        }
        List<String> low = new ArrayList<>();
        for (String t : texts) {
            for (String s : surfaces) {
                double c = contrast(vars.get(t), vars.get(s));
                if (c < MIN_TEXT) {
                    low.add(String.format(java.util.Locale.ROOT, "%s on %s %.2f", t, s, c));
                }
            }
        }
        for (String[] pair : ownPairs) {
            double c = contrast(vars.get(pair[1]), vars.get(pair[2]));
            if (c < MIN_TEXT) {
                low.add(String.format(java.util.Locale.ROOT, "%s: %s on %s %.2f", pair[0], pair[1], pair[2], c));
            }
        }
        assertTrue(texts.size() >= 8 && surfaces.size() >= 8, "the parse found the sheets' colours: " + texts + surfaces);
        assertTrue(low.isEmpty(), theme + ": " + String.join("; ", low));
    }

    @ParameterizedTest(name = "{0} palette")
    @ValueSource(strings = {"light", "dark"})
    void everyTextColourOfTheDrawing(String theme) {
        Palette pal = theme.equals("light") ? Palette.LIGHT : Palette.DARK;
        Map<String, Colour> texts = new LinkedHashMap<>();
        texts.put("labelInk", pal.labelInk());
        texts.put("valueInk", pal.valueInk());
        texts.put("voltage", pal.voltage());
        texts.put("current", pal.current());
        texts.put("ok", pal.ok());
        texts.put("warn", pal.warn());
        texts.put("fail", pal.fail());
        List<String> low = new ArrayList<>();
        for (Map.Entry<String, Colour> t : texts.entrySet()) {
            // tags are drawn on tagFill; badges on tagFill mixed 14 % with their accent; labels on paper
            List<Colour> grounds = List.of(pal.paper(), pal.tagFill(), pal.tagFill().mix(t.getValue(), 0.14));
            for (Colour g : grounds) {
                double c = contrast(rgb(t.getValue()), rgb(g));
                if (c < MIN_TEXT) {
                    low.add(String.format(java.util.Locale.ROOT, "%s on %s %.2f", t.getKey(), g, c));
                }
            }
        }
        assertTrue(low.isEmpty(), theme + ": " + String.join("; ", low));
    }
}
