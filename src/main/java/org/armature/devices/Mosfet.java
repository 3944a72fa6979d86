package org.armature.devices;

import java.util.Objects;

/**
 * N-channel enhancement MOSFET after H. Shichman and D. A. Hodges, "Modeling and simulation of
 * insulated-gate field-effect transistor switching circuits", IEEE J. Solid-State Circuits
 * SC-3, 1968 (the level-1 square law), with channel-length modulation λ:
 * <pre>
 *   cutoff     VGS ≤ VT:           ID = 0
 *   triode     VDS &lt; VGS − VT:     ID = β·(VGS − VT − VDS/2)·VDS·(1 + λ·VDS)
 *   saturation VDS ≥ VGS − VT:     ID = β/2·(VGS − VT)²·(1 + λ·VDS)
 * </pre>
 * For VDS &lt; 0 source and drain interchange (the device is symmetric): the law is applied to
 * (VGD, −VDS) and the current reversed; the derivatives are returned with respect to the
 * original VGS and VDS. Temperature: VT(T) = VT0 + dVT/dT·(T − Tnom), β(T) = β·(T/Tnom)^exp.
 * The body diode is a separate {@link Diode} the solver adds (params in
 * {@link MosfetParams#bodyDiode()}). Immutable; {@link #evaluate} allocates nothing.
 */
public final class Mosfet {

    private final MosfetParams params;

    /** @param params the transistor parameters */
    public Mosfet(MosfetParams params) {
        this.params = Objects.requireNonNull(params, "params");
    }

    /** @return the parameters */
    public MosfetParams params() {
        return params;
    }

    /**
     * @param temperatureKelvin junction temperature, kelvin
     * @return VT at that temperature, volts
     */
    public double thresholdAt(double temperatureKelvin) {
        return params.thresholdVolts()
                + params.thresholdTempcoVoltsPerKelvin() * (temperatureKelvin - params.nominalTemperatureKelvin());
    }

    /**
     * @param temperatureKelvin junction temperature, kelvin
     * @return β at that temperature, A/V²
     */
    public double betaAt(double temperatureKelvin) {
        return params.transconductanceAmpsPerVoltSquared()
                * Math.pow(temperatureKelvin / params.nominalTemperatureKelvin(), params.mobilityTempExponent());
    }

    /**
     * Drain current and its derivatives.
     *
     * @param vgsVolts gate–source voltage, volts
     * @param vdsVolts drain–source voltage, volts (either sign)
     * @param temperatureKelvin junction temperature, kelvin
     * @param out overwritten with ID (A), ∂ID/∂VGS (S), ∂ID/∂VDS (S)
     */
    public void evaluate(double vgsVolts, double vdsVolts, double temperatureKelvin, MosfetEvaluation out) {
        double vt = thresholdAt(temperatureKelvin);
        double beta = betaAt(temperatureKelvin);
        double lambda = params.channelLengthModulationPerVolt();
        boolean reversed = vdsVolts < 0;
        double vgs = reversed ? vgsVolts - vdsVolts : vgsVolts;
        double vds = reversed ? -vdsVolts : vdsVolts;
        double overdrive = vgs - vt;
        double id;
        double dIdVgs;
        double dIdVds;
        if (overdrive <= 0) {
            id = 0.0;
            dIdVgs = 0.0;
            dIdVds = 0.0;
        } else {
            double clm = 1.0 + lambda * vds;
            if (vds < overdrive) {
                double core = (overdrive - 0.5 * vds) * vds;
                id = beta * core * clm;
                dIdVgs = beta * vds * clm;
                dIdVds = beta * ((overdrive - vds) * clm + lambda * core);
            } else {
                double core = 0.5 * overdrive * overdrive;
                id = beta * core * clm;
                dIdVgs = beta * overdrive * clm;
                dIdVds = beta * lambda * core;
            }
        }
        if (reversed) {
            // ID(vgs, vds) = −f(vgs − vds, −vds)
            out.set(-id, -dIdVgs, dIdVgs + dIdVds);
        } else {
            out.set(id, dIdVgs, dIdVds);
        }
    }

    /**
     * Limits a Newton step of the gate–source voltage with
     * {@link Junctions#limitGateStep(double, double, double, GateStepOptions)} at this device's
     * threshold.
     *
     * @param vNewVolts proposed VGS, volts
     * @param vOldVolts previous VGS, volts
     * @param temperatureKelvin junction temperature, kelvin
     * @param options step limits
     * @return the limited VGS, volts
     */
    public double limitGateStep(double vNewVolts, double vOldVolts, double temperatureKelvin,
            GateStepOptions options) {
        return Junctions.limitGateStep(vNewVolts, vOldVolts, thresholdAt(temperatureKelvin), options);
    }
}
