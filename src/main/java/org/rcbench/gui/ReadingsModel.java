package org.rcbench.gui;

import java.util.ArrayList;
import java.util.List;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.rcbench.circuit.Topology;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.measure.Measurement;

/**
 * The large live readings: which ones a topology has, and their values against the expectation.
 * Window thread only.
 */
public final class ReadingsModel {
    /** Averaging choice meaning "every cycle since the start". */
    public static final int WHOLE_RUN = 0;

    private final ObservableList<Reading> readings = FXCollections.observableArrayList();
    private final ObservableList<Reading> readOnly = FXCollections.unmodifiableObservableList(readings);
    private Topology topology;

    ReadingsModel() {
        build(null);
    }

    /** The readings shown, in display order; replaced when the design's topology changes. */
    public ObservableList<Reading> readings() {
        return readOnly;
    }

    /** The reading of {@code q}, or null when it is not shown. */
    public Reading reading(TimingQuantity q) {
        for (Reading r : readings) {
            if (r.quantity() == q) {
                return r;
            }
        }
        return null;
    }

    /** Shows the readings {@code topology} has (null: no design, the astable set without predictions). */
    void build(Topology t) {
        if (t == topology && !readings.isEmpty()) {
            return;
        }
        topology = t;
        List<Reading> list = new ArrayList<>();
        if (t == Topology.MONOSTABLE) {
            list.add(new Reading(TimingQuantity.PULSE_WIDTH, "Pulse width"));
            list.add(new Reading(TimingQuantity.PERIOD, "Repeat period"));
        } else {
            list.add(new Reading(TimingQuantity.FREQUENCY, "Frequency"));
            list.add(new Reading(TimingQuantity.PERIOD, "Period"));
            list.add(new Reading(TimingQuantity.DUTY, "Duty cycle"));
            list.add(new Reading(TimingQuantity.HIGH, "High time"));
            list.add(new Reading(TimingQuantity.LOW, "Low time"));
        }
        readings.setAll(list);
    }

    /**
     * Updates every reading from {@code frame} (null: nothing measured yet) against {@code e}
     * (null: no design), averaging over {@code averaging} cycles or {@link #WHOLE_RUN}.
     */
    void update(LiveFrame frame, Expectation e, int averaging) {
        Measurement m = frame == null ? null : frame.measurement();
        boolean settling = frame == null || m.cycles() < 2 * Steadiness.MIN_CYCLES || !frame.steady();
        for (Reading r : readings) {
            TimingQuantity q = r.quantity();
            double v = m == null ? Double.NaN : measured(m, q, averaging);
            String detail = m == null || Double.isNaN(v) ? "" : detail(m, q, averaging);
            Expected x = e == null ? null : e.of(q);
            String expected = x == null ? "" : "expected " + Formats.shortValue(q, x.nominal());
            String band = x == null ? "" : band(q, x);
            r.show(v, Formats.value(q, v), detail, expected, band,
                    x == null ? "" : deviationText(v, x.nominal()), ReadingState.of(v, x, settling));
        }
    }

    /** The measured value of {@code q}: rolling over the window, or the whole run. */
    static double measured(Measurement m, TimingQuantity q, int averaging) {
        if (m.cycles() == 0) {
            return Double.NaN;
        }
        if (averaging == WHOLE_RUN) {
            switch (q) {
                case FREQUENCY: return m.frequency().frequencyHz();
                case PERIOD: return m.period().meanSeconds();
                case DUTY: return m.duty();
                case HIGH:
                case PULSE_WIDTH: return m.high().meanSeconds();
                case LOW: return m.low().meanSeconds();
                default: return Double.NaN;
            }
        }
        Measurement.Rolling r = m.rolling();
        switch (q) {
            case FREQUENCY: return r.frequencyHz();
            case PERIOD: return r.periodSeconds();
            case DUTY: return r.duty();
            case HIGH:
            case PULSE_WIDTH: return r.highSeconds();
            case LOW: return r.lowSeconds();
            default: return Double.NaN;
        }
    }

    private static String detail(Measurement m, TimingQuantity q, int averaging) {
        if (averaging != WHOLE_RUN) {
            String jitter = q == TimingQuantity.PERIOD && Double.isFinite(m.rolling().periodJitterRmsSeconds())
                    ? ", jitter " + Formats.plusMinus(q, m.rolling().periodJitterRmsSeconds()).substring(2) + " rms"
                    : "";
            return "last " + m.rolling().cycles() + " cycles" + jitter;
        }
        double u;
        switch (q) {
            case FREQUENCY: u = m.frequency().expandedHz(); break;
            case PERIOD: u = 2 * m.period().standardUncertaintySeconds(); break;
            case DUTY: u = 2 * m.dutyStandardUncertainty(); break;
            case HIGH:
            case PULSE_WIDTH: u = 2 * m.high().standardUncertaintySeconds(); break;
            case LOW: u = 2 * m.low().standardUncertaintySeconds(); break;
            default: u = Double.NaN;
        }
        String pm = Formats.plusMinus(q, u);
        return (pm.isEmpty() ? "" : pm + " (k = 2), ") + m.cycles() + " cycles";
    }

    private static String band(TimingQuantity q, Expected x) {
        if (x.hasStatistical() && x.hasWorstCase()) {
            return "band " + Formats.range(q, x.statLow(), x.statHigh()) + "\nworst case "
                    + Formats.range(q, x.worstLow(), x.worstHigh());
        }
        if (x.hasStatistical()) {
            return "band " + Formats.range(q, x.statLow(), x.statHigh());
        }
        if (x.hasWorstCase()) {
            return "worst case " + Formats.range(q, x.worstLow(), x.worstHigh());
        }
        return "no band known";
    }

    private static String deviationText(double v, double nominal) {
        String d = Formats.deviation(v, nominal);
        return d.isEmpty() ? "" : d + " from nominal";
    }
}
