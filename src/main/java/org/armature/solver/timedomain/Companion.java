package org.armature.solver.timedomain;

/**
 * Companion models of the reactive elements for one time step: the discretised element law as a
 * linear resistive element plus a source, which the nodal solve then treats like any other.
 *
 * <p>Capacitor {@code i = C·dv/dt} → Norton form {@code i = G·v + J} with {@code G = C·a0} and
 * {@code J = C·history}. Inductor {@code v = L·di/dt} → Thevenin form {@code v = R·i + E} with
 * {@code R = L·a0} and {@code E = L·history}, stamped as a branch whose current is an unknown of the
 * nodal system (modified nodal analysis, Ho, Ruehli and Brennan, IEEE Trans. CAS-22, 1975).
 */
public final class Companion {

    private Companion() {
    }

    /**
     * Norton companion of a linear capacitor: {@code i(n+1) = conductance·v(n+1) + current}, with i
     * flowing from terminal a through the capacitor to terminal b and v = v(a) − v(b).
     *
     * @param capacitanceFarads C, farads, not negative
     * @param k the step's coefficients
     * @param vNow v at the last accepted point, volts
     * @param vBefore v one point earlier, volts
     * @param iNow capacitor current at the last accepted point, amperes (the trapezoidal history)
     * @return the companion
     */
    public static Norton capacitor(double capacitanceFarads, IntegratorCoefficients k, double vNow, double vBefore,
                                   double iNow) {
        double dvNow = capacitanceFarads > 0 ? iNow / capacitanceFarads : 0;
        return new Norton(capacitanceFarads * k.a0(), capacitanceFarads * k.history(vNow, vBefore, dvNow));
    }

    /**
     * Thevenin companion of a linear inductor: {@code v(n+1) = resistance·i(n+1) + volts}, with i
     * flowing from a to b through the inductor and v = v(a) − v(b).
     *
     * @param inductanceHenries L, henries, not negative
     * @param k the step's coefficients
     * @param iNow i at the last accepted point, amperes
     * @param iBefore i one point earlier, amperes
     * @param vNow inductor voltage at the last accepted point, volts (the trapezoidal history)
     * @return the companion
     */
    public static Thevenin inductor(double inductanceHenries, IntegratorCoefficients k, double iNow, double iBefore,
                                    double vNow) {
        double diNow = inductanceHenries > 0 ? vNow / inductanceHenries : 0;
        return new Thevenin(inductanceHenries * k.a0(), inductanceHenries * k.history(iNow, iBefore, diNow));
    }

    /**
     * A conductance with a parallel current: {@code i = conductanceSiemens·v + currentAmps}.
     *
     * @param conductanceSiemens G, siemens
     * @param currentAmps J, amperes, flowing a → b
     */
    public record Norton(double conductanceSiemens, double currentAmps) {
    }

    /**
     * A resistance with a series voltage: {@code v = resistanceOhms·i + volts}.
     *
     * @param resistanceOhms R, ohms
     * @param volts E, volts
     */
    public record Thevenin(double resistanceOhms, double volts) {
    }
}
