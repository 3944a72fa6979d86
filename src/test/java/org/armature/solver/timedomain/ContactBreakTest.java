package org.armature.solver.timedomain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.armature.solver.timedomain.ContactBreak.Protection;
import org.armature.solver.timedomain.ContactBreak.Setup;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class ContactBreakTest {

    /** A 24 V DC solenoid: 48 Ω, 1.15 H (L/R 24 ms), 0.5 A. */
    private static final Setup SOLENOID = new Setup(24, 48, 1.152, ContactBreak.STRAY_FARADS, Protection.NONE, 0, 0, 0);

    static double closedFormPeak(double v, double r, double l, double rs, double c) {
        return ContactBreakClosedForm.peak(v, r, l, rs, c);
    }

    @Test
    @DisplayName("RL break through an RC across the contacts: peak contact voltage within 5 % of the second-order closed form (derived, CT-10)")
    void rcSnubberMatchesClosedForm() {
        // the RC rule of thumb (CT-7, common practice): 0.5 Ω per contact volt, 0.5 µF per contact amp
        double rs = 0.5 * 24;
        double c = 0.5e-6 * 0.5;
        ContactBreak.Result r = ContactBreak.run(SOLENOID.with(Protection.RC, rs, c, 0));
        double expected = closedFormPeak(24, 48, 1.152, rs, c + ContactBreak.STRAY_FARADS);
        assertEquals(expected, r.peakContactVolts(), 0.05 * expected, () -> "closed form " + expected);
        // and the small-R estimate V + I0·√(L/C) = 24 + 0.5·√(1.152/0.25e-6) = 1,097 V (derived, CT-10)
        assertEquals(24 + 0.5 * Math.sqrt(1.152 / c), r.peakContactVolts(), 0.05 * 1097);
        assertEquals(0.5, r.initialAmps(), 1e-3);
        assertEquals(0.5 * 1.152 * 0.25, r.storedJoules(), 1e-3); // ½·L·I0² = 0.144 J (derived, PC-11 form)
    }

    @Test
    @DisplayName("without protection the stray 100 pF rings to V + I0·√(L/C): tens of kilovolts (derived, SU-6 form)")
    void unprotectedRingsToKilovolts() {
        ContactBreak.Result r = ContactBreak.run(SOLENOID);
        double expected = closedFormPeak(24, 48, 1.152, 0, ContactBreak.STRAY_FARADS);
        assertEquals(expected, r.peakContactVolts(), 0.05 * expected);
        assertTrue(r.peakContactVolts() > 50e3, () -> "peak " + r.peakContactVolts());
    }

    @Test
    @DisplayName("a diode across the DC load holds the contacts at the rail plus one diode drop (derived)")
    void diodeAcrossLoad() {
        ContactBreak.Result r = ContactBreak.run(SOLENOID.with(Protection.DIODE, 0, 0, 0));
        assertTrue(r.peakContactVolts() > 24.3 && r.peakContactVolts() < 25.5, () -> "peak " + r.peakContactVolts());
        // the diode takes most of the stored energy (the rest heats the load's own resistance); derived
        assertTrue(r.protectionJoules() > 0 && r.protectionJoules() < r.storedJoules());
    }

    @Test
    @DisplayName("a varistor across the contacts clamps the contact voltage near its clamping voltage (derived)")
    void varistorClamps() {
        ContactBreak.Result r = ContactBreak.run(SOLENOID.with(Protection.VARISTOR, 0, 0, 100));
        assertTrue(r.peakContactVolts() > 95 && r.peakContactVolts() < 110, () -> "peak " + r.peakContactVolts());
        // energy into the clamp: ∫ Vc·i dt with i falling linearly-exponentially; at least the stored energy's share
        assertTrue(r.protectionJoules() > 0.5 * r.storedJoules(), () -> "E " + r.protectionJoules());
    }
}
