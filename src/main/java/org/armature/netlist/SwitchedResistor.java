package org.armature.netlist;


/**
 * A relay contact: a small resistance when closed, a large one when open, switched by a state slot
 * (1 = relay operated, 0 = released). A normally-open contact is closed when operated, a
 * normally-closed one when released. Resistances are from {@link ContactModel}.
 */
public final class SwitchedResistor extends TwoTerminalElement {

    private final int stateSlot;
    private final boolean closedWhenOperated;
    private final ContactModel model;

    /**
     * @param label designator and contact for messages
     * @param a node of one contact end
     * @param b node of the other
     * @param stateSlot slot holding 1 (operated) or 0 (released)
     * @param closedWhenOperated true for a normally-open contact
     * @param model closed and open resistances
     */
    public SwitchedResistor(String label, int a, int b, int stateSlot, boolean closedWhenOperated,
                            ContactModel model) {
        super(label, a, b);
        this.stateSlot = stateSlot;
        this.closedWhenOperated = closedWhenOperated;
        this.model = model;
    }

    /**
     * @param x a solution (its state slot says whether the relay is operated)
     * @return resistance in that state, Ω
     */
    public double ohms(Solution x) {
        return ohms(ContactState.of(x.state(stateSlot)).operated());
    }

    /**
     * @param operated the relay state
     * @return resistance in that state, Ω
     */
    public double ohms(boolean operated) {
        return operated == closedWhenOperated ? model.closedOhms() : model.openOhms();
    }

    /** @return the state slot that switches this contact (1 operated, 0 released) */
    public int stateSlot() {
        return stateSlot;
    }

    /** @return node of one contact end ({@link Netlist#GROUND} for ground) */
    public int nodeA() {
        return a;
    }

    /** @return node of the other contact end ({@link Netlist#GROUND} for ground) */
    public int nodeB() {
        return b;
    }

    /**
     * @param x a solution
     * @return current from a to b, A
     */
    public double current(Solution x) {
        return (x.voltage(a) - x.voltage(b)) / ohms(x);
    }

    @Override
    public boolean stamp(Stamper s, Solution x, StampContext ctx) {
        s.conductance(a, b, 1.0 / ohms(x));
        return false;
    }
}
