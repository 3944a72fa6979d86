package org.armature.netlist;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The drain–source step limiting of {@link MosfetElement} (the classic MOS rule, see its Javadoc). */
class DrainSourceLimitTest {

    @ParameterizedTest(name = "from {1} V towards {0} V: {2} V")
    @CsvSource(textBlock = """
            # new,   old,    limited   (source: the classic rule as documented, derived)
            20,      5,      17
            1,       5,      2
            4.5,     5,      4.5
            10,      1,      4
            -3,      1,      -0.5
            -0.3,    1,      -0.3
            # already below the fall stop (body diode conducting): the move is free
            -0.71,   -0.70,  -0.71
            -0.69,   -0.70,  -0.69
            # pinned at the stop by the last iteration: the next one moves on (else Newton never converges)
            -0.5000001, -0.5, -0.5000001
            """)
    void classicRule(double vNew, double vOld, double limited) {
        assertEquals(limited, MosfetElement.limitDrainSource(vNew, vOld), 1e-12);
    }
}
