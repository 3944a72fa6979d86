package org.armature.analysis;

/**
 * Steady junction temperature through a junction-to-ambient thermal resistance:
 * Tj = Ta + P·RθJA, hence the largest dissipation Pmax(Ta) = (Tj,max − Ta) / RθJA and its
 * derating slope 1/RθJA per kelvin of ambient (the datasheet power-derating curve; TH-1, TH-5).
 */
public final class ThermalBudget {

    private ThermalBudget() {
    }

    /**
     * @param ambientCelsius Ta, °C
     * @param powerWatts P, W, zero or positive
     * @param kelvinPerWatt RθJA, K/W
     * @return Tj, °C
     */
    public static double junctionCelsius(double ambientCelsius, double powerWatts, double kelvinPerWatt) {
        return ambientCelsius + powerWatts * kelvinPerWatt;
    }

    /**
     * @param tjMaxCelsius Tj,max, °C
     * @param ambientCelsius Ta, °C
     * @param kelvinPerWatt RθJA, K/W, positive
     * @return Pmax at that ambient, W (0 when Ta ≥ Tj,max)
     */
    public static double maxPowerWatts(double tjMaxCelsius, double ambientCelsius, double kelvinPerWatt) {
        return Math.max(0, (tjMaxCelsius - ambientCelsius) / kelvinPerWatt);
    }

    /**
     * @param kelvinPerWatt RθJA, K/W, positive
     * @return the derating slope, W per kelvin of ambient
     */
    public static double deratingWattsPerKelvin(double kelvinPerWatt) {
        return 1 / kelvinPerWatt;
    }
}
