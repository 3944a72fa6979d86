package org.armature.devices;

import java.util.Objects;

/**
 * Bipolar junction transistor: the transport form of J. J. Ebers and J. L. Moll, "Large-signal
 * behavior of junction transistors", Proc. IRE 42, 1954, with the normalised base charge of
 * H. K. Gummel and H. C. Poon, "An integral charge control model of bipolar transistors",
 * Bell Syst. Tech. J. 49, 1970, for the Early effect (VAF, VAR) and high-injection roll-off
 * (IKF, IKR). In the NPN frame:
 * <pre>
 *   IF = IS·(e^(VBE/(NF·VT)) − 1)        IR = IS·(e^(VBC/(NR·VT)) − 1)
 *   q1 = 1 / (1 − VBC/VAF − VBE/VAR)      q2 = IF/IKF + IR/IKR
 *   qb = q1·(1 + √(1 + 4·q2)) / 2
 *   IC = (IF − IR)/qb − IR/BR             IB = IF/BF + IR/BR
 * </pre>
 * so that hFE = BF/qb falls at high current (IKF) and IC rises with VCE (VAF). Low-current
 * recombination (the Gummel–Poon ISE/ISC terms) is not modelled: gain is flat at low current.
 * A PNP mirrors all junction voltages and currents ({@link BjtPolarity#sign()}); the partial
 * derivatives are then unchanged in sign.
 *
 * <p>Temperature: VT = kT/q; IS(T) by {@link Junctions#saturationCurrentAt} with XTI and Eg;
 * BF(T) = BF·(T/Tnom)^XTB and likewise BR. The terminal resistances RB, RC, RE live in the
 * parameters; the solver makes the internal nodes and this class works on intrinsic junction
 * voltages. Immutable and thread-safe; {@link #evaluate} allocates nothing.
 */
public final class Bjt {

    /**
     * Smallest Early denominator 1 − VBC/VAF − VBE/VAR used. It only binds at junction voltages
     * comparable to the Early voltage in the forward direction, which no physical operating
     * point reaches; it keeps q1 finite for wild Newton iterates.
     */
    public static final double MIN_EARLY_DENOMINATOR = 1e-3;

    private final BjtParams params;

    /** @param params the transistor parameters */
    public Bjt(BjtParams params) {
        this.params = Objects.requireNonNull(params, "params");
    }

    /** @return the parameters */
    public BjtParams params() {
        return params;
    }

    /**
     * @param temperatureKelvin junction temperature, kelvin
     * @return IS at that temperature, amperes
     */
    public double saturationCurrentAt(double temperatureKelvin) {
        return Junctions.saturationCurrentAt(params.saturationCurrentAmps(), temperatureKelvin,
                params.nominalTemperatureKelvin(), params.saturationCurrentTempExponent(),
                params.bandGapElectronVolts(), 1.0);
    }

    /**
     * @param temperatureKelvin junction temperature, kelvin
     * @return the hFE temperature factor (T/Tnom)^XTB
     */
    public double betaTemperatureFactor(double temperatureKelvin) {
        return Math.pow(temperatureKelvin / params.nominalTemperatureKelvin(), params.betaTempExponent());
    }

    /**
     * Terminal currents and their partial derivatives at the given intrinsic junction voltages.
     *
     * @param vbeVolts base–emitter voltage, volts (negative in forward operation of a PNP)
     * @param vbcVolts base–collector voltage, volts
     * @param temperatureKelvin junction temperature, kelvin
     * @param out overwritten with IC, IB and ∂IC/∂VBE, ∂IC/∂VBC, ∂IB/∂VBE, ∂IB/∂VBC
     */
    public void evaluate(double vbeVolts, double vbcVolts, double temperatureKelvin, BjtEvaluation out) {
        double p = params.polarity().sign();
        double vbe = p * vbeVolts;
        double vbc = p * vbcVolts;
        double vt = Thermal.voltage(temperatureKelvin);
        double is = saturationCurrentAt(temperatureKelvin);
        double betaFactor = betaTemperatureFactor(temperatureKelvin);
        double bf = params.betaForward() * betaFactor;
        double br = params.betaReverse() * betaFactor;

        double nfVt = params.forwardEmissionCoefficient() * vt;
        double nrVt = params.reverseEmissionCoefficient() * vt;
        double xf = vbe / nfVt;
        double xr = vbc / nrVt;
        double iF = is * Junctions.safeExpm1(xf);
        double gF = is * Junctions.safeExpSlope(xf) / nfVt;
        double iR = is * Junctions.safeExpm1(xr);
        double gR = is * Junctions.safeExpSlope(xr) / nrVt;

        double invVaf = 1.0 / params.forwardEarlyVolts();
        double invVar = 1.0 / params.reverseEarlyVolts();
        double denominator = 1.0 - vbc * invVaf - vbe * invVar;
        double q1;
        double dq1Dvbe;
        double dq1Dvbc;
        if (denominator > MIN_EARLY_DENOMINATOR) {
            q1 = 1.0 / denominator;
            dq1Dvbe = q1 * q1 * invVar;
            dq1Dvbc = q1 * q1 * invVaf;
        } else {
            q1 = 1.0 / MIN_EARLY_DENOMINATOR;
            dq1Dvbe = 0.0;
            dq1Dvbc = 0.0;
        }
        double invIkf = 1.0 / params.forwardKneeCurrentAmps();
        double invIkr = 1.0 / params.reverseKneeCurrentAmps();
        double q2 = iF * invIkf + iR * invIkr;
        // q2 >= -(IS/IKF + IS/IKR) > -1/4 for any sane knee; the floor only guards the sqrt
        double s = Math.sqrt(Math.max(1.0 + 4.0 * q2, Double.MIN_NORMAL));
        double qb = 0.5 * q1 * (1.0 + s);
        double dqbDq1 = 0.5 * (1.0 + s);
        double dqbDq2 = q1 / s;
        double dqbDvbe = dqbDq1 * dq1Dvbe + dqbDq2 * gF * invIkf;
        double dqbDvbc = dqbDq1 * dq1Dvbc + dqbDq2 * gR * invIkr;

        double iT = (iF - iR) / qb;
        double dItDvbe = (gF - iT * dqbDvbe) / qb;
        double dItDvbc = (-gR - iT * dqbDvbc) / qb;

        double ic = iT - iR / br;
        double ib = iF / bf + iR / br;
        out.set(p * ic, p * ib, dItDvbe, dItDvbc - gR / br, gF / bf, gR / br);
    }

    /**
     * Junction voltages at which the model carries the given collector and base currents
     * (two-dimensional Newton with Nagel limiting on both junctions). With IC/IB below hFE this
     * is the saturated operating point; VCE(sat) = VBE − VBC.
     *
     * @param collectorAmps IC into the collector, amperes (negative for a PNP)
     * @param baseAmps IB into the base, amperes (same sign as IC)
     * @param temperatureKelvin junction temperature, kelvin
     * @param options iteration limit and tolerance
     * @return the junction voltages
     * @throws DeviceConvergenceException if Newton does not converge
     */
    public BjtJunctionSolution junctionsForCurrents(double collectorAmps, double baseAmps,
            double temperatureKelvin, DeviceNewtonOptions options) {
        double p = params.polarity().sign();
        double vt = Thermal.voltage(temperatureKelvin);
        double is = saturationCurrentAt(temperatureKelvin);
        double nfVt = params.forwardEmissionCoefficient() * vt;
        double nrVt = params.reverseEmissionCoefficient() * vt;
        double critF = Junctions.criticalVoltage(nfVt, is);
        double critR = Junctions.criticalVoltage(nrVt, is);
        BjtEvaluation e = new BjtEvaluation();
        double vbe = 0.0;
        double vbc = 0.0;
        double step = Double.POSITIVE_INFINITY;
        for (int k = 1; k <= options.maxIterations(); k++) {
            evaluate(p * vbe, p * vbc, temperatureKelvin, e);
            double rc = p * collectorAmps - p * e.collectorAmps();
            double rb = p * baseAmps - p * e.baseAmps();
            double a = e.dCollectorDvbe();
            double b = e.dCollectorDvbc();
            double c = e.dBaseDvbe();
            double d = e.dBaseDvbc();
            double det = a * d - b * c;
            double dvbe = (rc * d - b * rb) / det;
            double dvbc = (a * rb - c * rc) / det;
            double newVbe = Junctions.limitJunction(vbe + dvbe, vbe, nfVt, critF);
            double newVbc = Junctions.limitJunction(vbc + dvbc, vbc, nrVt, critR);
            boolean limited = newVbe != vbe + dvbe || newVbc != vbc + dvbc;
            step = Math.max(Math.abs(newVbe - vbe), Math.abs(newVbc - vbc));
            vbe = newVbe;
            vbc = newVbc;
            if (!limited && step <= options.voltageToleranceVolts()) {
                return new BjtJunctionSolution(p * vbe, p * vbc, k);
            }
        }
        throw new DeviceConvergenceException("BJT junctions for given currents", options.maxIterations(), step);
    }

    /**
     * Base–emitter voltage at which the model carries the given collector current at a fixed
     * collector–emitter voltage (one-dimensional Newton, VBC = VBE − VCE).
     *
     * @param collectorAmps IC, amperes (negative for a PNP)
     * @param vceVolts VCE, volts (negative for a PNP in forward operation)
     * @param temperatureKelvin junction temperature, kelvin
     * @param options iteration limit and tolerance
     * @return the junction voltages
     * @throws DeviceConvergenceException if Newton does not converge
     */
    public BjtJunctionSolution vbeForCollectorCurrent(double collectorAmps, double vceVolts,
            double temperatureKelvin, DeviceNewtonOptions options) {
        double p = params.polarity().sign();
        double vt = Thermal.voltage(temperatureKelvin);
        double nfVt = params.forwardEmissionCoefficient() * vt;
        double crit = Junctions.criticalVoltage(nfVt, saturationCurrentAt(temperatureKelvin));
        BjtEvaluation e = new BjtEvaluation();
        double vce = p * vceVolts;
        double vbe = 0.0;
        double step = Double.POSITIVE_INFINITY;
        for (int k = 1; k <= options.maxIterations(); k++) {
            evaluate(p * vbe, p * (vbe - vce), temperatureKelvin, e);
            double residual = p * collectorAmps - p * e.collectorAmps();
            double slope = e.dCollectorDvbe() + e.dCollectorDvbc();
            double proposed = vbe + residual / slope;
            double limitedVbe = Junctions.limitJunction(proposed, vbe, nfVt, crit);
            step = Math.abs(limitedVbe - vbe);
            vbe = limitedVbe;
            if (limitedVbe == proposed && step <= options.voltageToleranceVolts()) {
                return new BjtJunctionSolution(p * vbe, p * (vbe - vce), k);
            }
        }
        throw new DeviceConvergenceException("BJT VBE for collector current", options.maxIterations(), step);
    }

    /**
     * Closed-form Ebers–Moll saturation voltage at a forced gain βf = IC/IB (textbook result,
     * e.g. Sedra &amp; Smith): VCE(sat) = VT·ln[(1 + (βf + 1)/βR) / (1 − βf/βF)], valid for
     * 0 &lt; βf &lt; βF, NF = NR = 1, no Early effect or high injection.
     *
     * @param forcedBeta βf = IC/IB, dimensionless, 0 &lt; βf &lt; betaForward
     * @param betaForward βF
     * @param betaReverse βR
     * @param temperatureKelvin temperature, kelvin
     * @return VCE(sat), volts
     */
    public static double saturationVoltageClosedForm(double forcedBeta, double betaForward, double betaReverse,
            double temperatureKelvin) {
        Checks.positiveFinite(forcedBeta, "forcedBeta");
        Checks.positiveFinite(betaReverse, "betaReverse");
        if (!(forcedBeta < betaForward)) {
            throw new IllegalArgumentException("forcedBeta must be below betaForward: " + forcedBeta);
        }
        return Thermal.voltage(temperatureKelvin)
                * Math.log((1.0 + (forcedBeta + 1.0) / betaReverse) / (1.0 - forcedBeta / betaForward));
    }
}
