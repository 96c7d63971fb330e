package org.rcbench.circuit;

/**
 * The result of one model evaluation, written in place so that repeated evaluation allocates
 * nothing. Not thread-safe: use one holder per thread.
 *
 * <p>Times are seconds, frequency hertz, duty a fraction of the period spent high. Quantities a
 * circuit does not have are {@code NaN}: a monostable has a pulse width (also reported as the high
 * time) but a period only when the design gives a trigger interval; a bistable has no timing. When
 * {@link #runs()} is false every timing quantity is {@code NaN} and {@link #reason()} says why.
 */
public final class Timing {
    double highSeconds;
    double lowSeconds;
    double periodSeconds;
    double frequencyHz;
    double duty;
    double firstHighSeconds;
    double pulseWidthSeconds;
    double upperVolts;
    double lowerVolts;
    double responseSeconds;
    boolean runs;
    boolean oscillates;
    StopReason reason;
    double reasonA;
    double reasonB;
    String reasonDetail;

    /** Clears every field to "not running, no numbers". */
    void clear() {
        highSeconds = Double.NaN;
        lowSeconds = Double.NaN;
        periodSeconds = Double.NaN;
        frequencyHz = Double.NaN;
        duty = Double.NaN;
        firstHighSeconds = Double.NaN;
        pulseWidthSeconds = Double.NaN;
        upperVolts = Double.NaN;
        lowerVolts = Double.NaN;
        responseSeconds = Double.NaN;
        runs = false;
        oscillates = false;
        reason = null;
        reasonA = Double.NaN;
        reasonB = Double.NaN;
        reasonDetail = null;
    }

    void stop(StopReason r, double a, double b) {
        double upper = upperVolts;
        double lower = lowerVolts;
        clear();
        upperVolts = upper;
        lowerVolts = lower;
        reason = r;
        reasonA = a;
        reasonB = b;
    }

    void stop(String detail) {
        stop(StopReason.DEGENERATE, Double.NaN, Double.NaN);
        reasonDetail = detail;
    }

    /** Fills the period, frequency and duty from high and low and marks the circuit running and oscillating. */
    void cycle(double high, double low, double firstHigh) {
        highSeconds = high;
        lowSeconds = low;
        periodSeconds = high + low;
        frequencyHz = 1 / periodSeconds;
        duty = high / periodSeconds;
        firstHighSeconds = firstHigh;
        runs = true;
        oscillates = true;
    }

    /** Time the output is high per cycle (s); for a monostable, the pulse width. */
    public double highSeconds() {
        return highSeconds;
    }

    public double lowSeconds() {
        return lowSeconds;
    }

    public double periodSeconds() {
        return periodSeconds;
    }

    public double frequencyHz() {
        return frequencyHz;
    }

    /** High time over period, in [0, 1]. */
    public double duty() {
        return duty;
    }

    /** The first high time after power-up, with the capacitor starting at 0 V (s). */
    public double firstHighSeconds() {
        return firstHighSeconds;
    }

    /** The monostable's output pulse width (s); NaN for other topologies. */
    public double pulseWidthSeconds() {
        return pulseWidthSeconds;
    }

    /** The upper threshold: the control-pin voltage (V). */
    public double upperVolts() {
        return upperVolts;
    }

    /** The lower threshold: half the control-pin voltage (V). */
    public double lowerVolts() {
        return lowerVolts;
    }

    /** Input-to-output response time (the propagation delay), for a bistable (s). */
    public double responseSeconds() {
        return responseSeconds;
    }

    /** Whether the circuit does its job: oscillates (astables), times out (monostable) or latches (bistable). */
    public boolean runs() {
        return runs;
    }

    /** Whether the circuit oscillates by itself. */
    public boolean oscillates() {
        return oscillates;
    }

    /** Why it does not run or not oscillate; null for a running astable. */
    public StopReason reason() {
        return reason;
    }

    /** The reason in words (allocates), or null. */
    public String reasonText() {
        return reason == null ? null : reason.text(reasonA, reasonB, reasonDetail);
    }

    /** The value of one quantity. */
    public double value(TimingQuantity q) {
        switch (q) {
            case FREQUENCY: return frequencyHz;
            case PERIOD: return periodSeconds;
            case HIGH: return highSeconds;
            case LOW: return lowSeconds;
            case DUTY: return duty;
            case FIRST_HIGH: return firstHighSeconds;
            case PULSE_WIDTH: return pulseWidthSeconds;
            default: throw new IllegalArgumentException(q.name());
        }
    }

    /** Copies every field from {@code other}. */
    public void copyFrom(Timing other) {
        highSeconds = other.highSeconds;
        lowSeconds = other.lowSeconds;
        periodSeconds = other.periodSeconds;
        frequencyHz = other.frequencyHz;
        duty = other.duty;
        firstHighSeconds = other.firstHighSeconds;
        pulseWidthSeconds = other.pulseWidthSeconds;
        upperVolts = other.upperVolts;
        lowerVolts = other.lowerVolts;
        responseSeconds = other.responseSeconds;
        runs = other.runs;
        oscillates = other.oscillates;
        reason = other.reason;
        reasonA = other.reasonA;
        reasonB = other.reasonB;
        reasonDetail = other.reasonDetail;
    }

    @Override
    public String toString() {
        return "Timing[runs=" + runs + ", high=" + highSeconds + ", low=" + lowSeconds + ", period=" + periodSeconds
                + ", duty=" + duty + ", firstHigh=" + firstHighSeconds + ", pulse=" + pulseWidthSeconds
                + ", upper=" + upperVolts + ", lower=" + lowerVolts + ", reason=" + reasonText() + "]";
    }
}
