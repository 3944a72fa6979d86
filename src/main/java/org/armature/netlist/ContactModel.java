package org.armature.netlist;

/**
 * Resistances of a relay contact in the DC model.
 *
 * @param closedOhms closed contact, Ω; default 0.05 Ω (small power relays state an initial
 *     contact resistance of at most 100 mΩ; common practice)
 * @param openOhms open contact, Ω; default 1 GΩ (insulation resistance of small relays is
 *     stated as ≥ 1 GΩ; common practice). Large enough to carry no visible current, small enough
 *     to keep a contact pin that connects to nothing else from floating.
 * @param insulationOhms insulation between the contact set (com) and the coil (A2), Ω; default
 *     1 GΩ (insulation resistance of small relays is stated as ≥ 1 GΩ at 500 V DC; common
 *     practice). It gives an unused or isolated contact set its DC reference.
 */
public record ContactModel(double closedOhms, double openOhms, double insulationOhms) {

    /** Defaults: 0.05 Ω closed, 1 GΩ open, 1 GΩ insulation. */
    public static final ContactModel DEFAULT = new ContactModel(0.05, 1e9, 1e9);

    public ContactModel {
        if (!(closedOhms > 0) || !Double.isFinite(closedOhms)) {
            throw new IllegalArgumentException("closedOhms must be positive and finite");
        }
        if (!(openOhms > closedOhms) || !Double.isFinite(openOhms)) {
            throw new IllegalArgumentException("openOhms must be finite and above closedOhms");
        }
        if (!(insulationOhms > 0) || !Double.isFinite(insulationOhms)) {
            throw new IllegalArgumentException("insulationOhms must be positive and finite");
        }
    }
}
