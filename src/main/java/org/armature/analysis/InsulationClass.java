package org.armature.analysis;

/**
 * The thermal classes of electrical insulation (IEC 60085, check-values.md CT-1): the letter and its
 * temperature limit, °C.
 */
enum InsulationClass {
    Y(90), A(105), E(120), B(130), F(155), H(180), N(200), R(220);

    private final double celsius;

    InsulationClass(double celsius) {
        this.celsius = celsius;
    }

    /** The class's temperature limit, °C. */
    double celsius() {
        return celsius;
    }

    /** " (class B, IEC 60085)" when the limit is a class temperature, else "". */
    static String words(double limitCelsius) {
        for (InsulationClass c : values()) {
            if (c.celsius == limitCelsius) {
                return " (class " + c.name() + ", IEC 60085)";
            }
        }
        return "";
    }
}
