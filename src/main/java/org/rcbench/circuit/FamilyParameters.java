package org.rcbench.circuit;

/**
 * The electrical behaviour of a timer chip that the timing depends on. Defaults per family are in
 * {@link TimerFamily#defaults()}; a design file may override any of them.
 *
 * @param dividerOhms         each of the three equal resistors of the internal divider (Ω); the control
 *                            pin sees 2/3 of the supply behind 2/3 of this value
 * @param outputHighDropVolts how far the output's high level sits below the supply with no load (V)
 * @param outputHighOhms      output resistance while high (Ω)
 * @param outputLowVolts      output low level with no load (V)
 * @param outputLowOhms       output resistance while low (Ω)
 * @param dischargeSatVolts   the discharge transistor's saturation voltage (V)
 * @param dischargeOhms       the discharge transistor's on-resistance in series with that voltage (Ω)
 * @param inputCurrentAmps    current drawn from the timing node by the threshold (and trigger) inputs (A)
 * @param delaySeconds        comparator-to-output propagation delay per transition (s)
 * @param minSupplyVolts      lowest recommended supply (V)
 * @param maxSupplyVolts      highest recommended supply (V)
 * @param maxInputCurrentAmps data-sheet maximum input current, used only for the practical resistance limit (A)
 * @param practicalMaxHz      the frequency above which timing accuracy suffers (Hz)
 */
public record FamilyParameters(double dividerOhms, double outputHighDropVolts, double outputHighOhms,
        double outputLowVolts, double outputLowOhms, double dischargeSatVolts, double dischargeOhms,
        double inputCurrentAmps, double delaySeconds, double minSupplyVolts, double maxSupplyVolts,
        double maxInputCurrentAmps, double practicalMaxHz) {

    public FamilyParameters {
        positive("dividerOhms", dividerOhms);
        nonNegative("outputHighDropVolts", outputHighDropVolts);
        nonNegative("outputHighOhms", outputHighOhms);
        nonNegative("outputLowVolts", outputLowVolts);
        nonNegative("outputLowOhms", outputLowOhms);
        nonNegative("dischargeSatVolts", dischargeSatVolts);
        nonNegative("dischargeOhms", dischargeOhms);
        nonNegative("inputCurrentAmps", inputCurrentAmps);
        nonNegative("delaySeconds", delaySeconds);
        nonNegative("minSupplyVolts", minSupplyVolts);
        positive("maxSupplyVolts", maxSupplyVolts);
        nonNegative("maxInputCurrentAmps", maxInputCurrentAmps);
        positive("practicalMaxHz", practicalMaxHz);
    }

    /** An idealised timer: exact 1/3 and 2/3 thresholds, rail-to-rail output, no saturation, leak or delay. */
    public static FamilyParameters ideal() {
        return new FamilyParameters(5000, 0, 0, 0, 0, 0, 0, 0, 0, 0, 1e3, 0, 1e12);
    }

    private static void positive(String name, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(name + " not positive and finite: " + v);
        }
    }

    private static void nonNegative(String name, double v) {
        if (!(v >= 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(name + " not finite and >= 0: " + v);
        }
    }

    public FamilyParameters withDividerOhms(double v) {
        return new FamilyParameters(v, outputHighDropVolts, outputHighOhms, outputLowVolts, outputLowOhms,
                dischargeSatVolts, dischargeOhms, inputCurrentAmps, delaySeconds, minSupplyVolts, maxSupplyVolts,
                maxInputCurrentAmps, practicalMaxHz);
    }

    public FamilyParameters withOutputHigh(double dropVolts, double ohms) {
        return new FamilyParameters(dividerOhms, dropVolts, ohms, outputLowVolts, outputLowOhms,
                dischargeSatVolts, dischargeOhms, inputCurrentAmps, delaySeconds, minSupplyVolts, maxSupplyVolts,
                maxInputCurrentAmps, practicalMaxHz);
    }

    public FamilyParameters withOutputLow(double volts, double ohms) {
        return new FamilyParameters(dividerOhms, outputHighDropVolts, outputHighOhms, volts, ohms,
                dischargeSatVolts, dischargeOhms, inputCurrentAmps, delaySeconds, minSupplyVolts, maxSupplyVolts,
                maxInputCurrentAmps, practicalMaxHz);
    }

    public FamilyParameters withDischarge(double satVolts, double ohms) {
        return new FamilyParameters(dividerOhms, outputHighDropVolts, outputHighOhms, outputLowVolts, outputLowOhms,
                satVolts, ohms, inputCurrentAmps, delaySeconds, minSupplyVolts, maxSupplyVolts,
                maxInputCurrentAmps, practicalMaxHz);
    }

    public FamilyParameters withInputCurrentAmps(double v) {
        return new FamilyParameters(dividerOhms, outputHighDropVolts, outputHighOhms, outputLowVolts, outputLowOhms,
                dischargeSatVolts, dischargeOhms, v, delaySeconds, minSupplyVolts, maxSupplyVolts,
                maxInputCurrentAmps, practicalMaxHz);
    }

    public FamilyParameters withDelaySeconds(double v) {
        return new FamilyParameters(dividerOhms, outputHighDropVolts, outputHighOhms, outputLowVolts, outputLowOhms,
                dischargeSatVolts, dischargeOhms, inputCurrentAmps, v, minSupplyVolts, maxSupplyVolts,
                maxInputCurrentAmps, practicalMaxHz);
    }

    public FamilyParameters withSupplyRange(double minVolts, double maxVolts) {
        return new FamilyParameters(dividerOhms, outputHighDropVolts, outputHighOhms, outputLowVolts, outputLowOhms,
                dischargeSatVolts, dischargeOhms, inputCurrentAmps, delaySeconds, minVolts, maxVolts,
                maxInputCurrentAmps, practicalMaxHz);
    }
}
