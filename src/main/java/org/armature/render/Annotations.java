package org.armature.render;

import java.util.List;
import org.armature.model.PinRef;

/**
 * The readouts drawn over a schematic: plain data, filled by a view model from a solve (or by a test),
 * never computed by the renderer. Every list may be empty; {@link #NONE} draws nothing.
 *
 * @param voltages node voltage tags, one per net to show
 * @param currents branch current tags with direction, each at a pin on a wire
 * @param badges a short verdict beside a part ("saturated, ×6.1 margin")
 * @param gauges coil current gauges beside relays
 * @param markers finding markers on parts
 * @param readings meter readings a technician entered in a fault hunt, each at its net
 */
public record Annotations(List<NodeVoltage> voltages, List<BranchCurrent> currents, List<PartBadge> badges,
                          List<RelayGauge> gauges, List<FindingMarker> markers, List<MeterReading> readings) {

    /** No readouts. */
    public static final Annotations NONE = new Annotations(List.of(), List.of(), List.of(), List.of(), List.of());

    public Annotations {
        voltages = List.copyOf(voltages);
        currents = List.copyOf(currents);
        badges = List.copyOf(badges);
        gauges = List.copyOf(gauges);
        markers = List.copyOf(markers);
        readings = List.copyOf(readings);
    }

    /** Readouts without meter readings. */
    public Annotations(List<NodeVoltage> voltages, List<BranchCurrent> currents, List<PartBadge> badges,
                       List<RelayGauge> gauges, List<FindingMarker> markers) {
        this(voltages, currents, badges, gauges, markers, List.of());
    }

    /** The same readouts with these meter readings in place of any before. */
    public Annotations withReadings(List<MeterReading> newReadings) {
        return new Annotations(voltages, currents, badges, gauges, markers, newReadings);
    }

    /** True when nothing would be drawn. */
    public boolean isEmpty() {
        return voltages.isEmpty() && currents.isEmpty() && badges.isEmpty() && gauges.isEmpty() && markers.isEmpty()
                && readings.isEmpty();
    }

    /**
     * A meter reading the technician took, drawn as a tag at its net ("high 11.9 V") in the ink of
     * the drawing rather than a solve's accent: it is measured, not computed. A net the drawing does
     * not have (the {@code coil} probe across the relay coil, say) is not drawn.
     *
     * @param net net name as {@link org.armature.model.Connectivity} names it
     * @param pinHigh the drive pin's state during the reading
     * @param volts the value read, volts
     */
    public record MeterReading(String net, boolean pinHigh, double volts) {
        public MeterReading {
            if (net == null || net.isBlank()) {
                throw new IllegalArgumentException("net must not be blank");
            }
        }

        /** "high" or "low". */
        public String state() {
            return pinHigh ? "high" : "low";
        }
    }

    /** How a verdict reads. */
    public enum State { OK, WARN, FAIL }

    /**
     * A node voltage, drawn as a tag with a leader to the net: to the net's test point pin if it has
     * one, else to the first pin on the net in designator order.
     *
     * @param net net name as {@link org.armature.model.Connectivity} names it
     * @param volts node voltage against ground
     */
    public record NodeVoltage(String net, double volts) {
        public NodeVoltage {
            if (net == null || net.isBlank()) {
                throw new IllegalArgumentException("net must not be blank");
            }
        }
    }

    /**
     * A branch current measured at a pin, drawn as an arrow on the wire leaving the pin and a tag.
     *
     * @param pin the part pin the current flows through
     * @param ampsIntoPin current into the part at that pin; negative flows out (the arrow turns round)
     */
    public record BranchCurrent(PinRef pin, double ampsIntoPin) {
        public BranchCurrent {
            if (pin == null) {
                throw new IllegalArgumentException("pin must not be null");
            }
        }
    }

    /**
     * A verdict beside a part.
     *
     * @param ref designator
     * @param text short words, one line
     * @param state how it reads
     */
    public record PartBadge(String ref, String text, State state) {
        public PartBadge {
            if (ref == null || text == null || state == null) {
                throw new IllegalArgumentException("badge needs a part, a text and a state");
            }
        }
    }

    /**
     * A relay's coil current against its thresholds, drawn as a small bar gauge.
     *
     * @param ref relay designator
     * @param coilAmps present coil current (magnitude)
     * @param dropOutAmps current below which the relay is sure to release
     * @param pickUpAmps current above which the relay is sure to operate, above dropOutAmps
     * @param operated the contacts' state as solved (between the thresholds it depends on history)
     */
    public record RelayGauge(String ref, double coilAmps, double dropOutAmps, double pickUpAmps, boolean operated) {

        /** A gauge whose contact state follows from the current alone (operated at or above pick-up). */
        public RelayGauge(String ref, double coilAmps, double dropOutAmps, double pickUpAmps) {
            this(ref, coilAmps, dropOutAmps, pickUpAmps, coilAmps >= pickUpAmps);
        }

        public RelayGauge {
            if (ref == null) {
                throw new IllegalArgumentException("ref must not be null");
            }
            if (!(dropOutAmps >= 0 && pickUpAmps > dropOutAmps)) {
                throw new IllegalArgumentException("pickUpAmps must exceed dropOutAmps >= 0 for gauge on " + ref);
            }
        }
    }

    /**
     * A finding marked on a part.
     *
     * @param ref designator
     * @param state severity as a verdict state
     * @param text short words shown in the marker's tag; may be empty for the symbol only
     */
    public record FindingMarker(String ref, State state, String text) {
        public FindingMarker {
            if (ref == null || state == null) {
                throw new IllegalArgumentException("marker needs a part and a state");
            }
            text = text == null ? "" : text;
        }
    }
}
