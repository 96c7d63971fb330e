package org.rcbench.stability;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.assertj.core.data.Offset;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class AllanFamilyTest {
    /** NIST SP 1065 section 12: the 9-point frequency data set of NBS Monograph 140, tau0 = 1. */
    private static final double[] NBS_Y = {892, 809, 823, 798, 671, 644, 883, 903, 677};

    private static double[] nbsPhase() {
        return PhaseData.fromFrequency(NBS_Y, 1.0);
    }

    /** NIST SP 1065 section 12: the 1000-point set n(i+1) = 16807 n(i) mod 2147483647, n0 = 1234567890. */
    private static double[] thousandPointPhase() {
        double[] y = new double[1000];
        long n = 1234567890L;
        for (int i = 0; i < y.length; i++) {
            y[i] = n / 2147483647.0;
            n = 16807L * n % 2147483647L;
        }
        return PhaseData.fromFrequency(y, 1.0);
    }

    private static Offset<Double> rel(double value) {
        return within(Math.abs(value) * 1e-6);
    }

    // Check values: NIST SP 1065 section 12 (Riley 2008), 9-point data set, via check-values.md.
    @ParameterizedTest(name = "m={0}")
    @CsvSource({
        "1, 91.22945, 91.22945, 91.22945, 52.67135, 70.80607, 91.22945",
        "2, 115.8082, 85.95287, 74.78849, 86.35831, 85.61487, 93.90379",
    })
    void nineNbsPointsMatchNistTable(int m, double adev, double oadev, double mdev, double tdev,
            double ohdev, double totdev) {
        double[] x = nbsPhase();
        assertThat(AllanDeviation.nonOverlapping(x, 1, m).deviation()).isCloseTo(adev, rel(adev));
        assertThat(AllanDeviation.overlapping(x, 1, m).deviation()).isCloseTo(oadev, rel(oadev));
        assertThat(AllanDeviation.modified(x, 1, m).deviation()).isCloseTo(mdev, rel(mdev));
        assertThat(AllanDeviation.time(x, 1, m).deviation()).isCloseTo(tdev, rel(tdev));
        assertThat(HadamardDeviation.overlapping(x, 1, m).deviation()).isCloseTo(ohdev, rel(ohdev));
        assertThat(TotalDeviation.of(x, 1, m).deviation()).isCloseTo(totdev, rel(totdev));
    }

    // Check values: NIST SP 1065 section 12, 1000-point generated set, via check-values.md.
    @ParameterizedTest(name = "m={0}")
    @CsvSource({
        "1,   2.922319e-01, 2.922319e-01",
        "10,  9.159953e-02, 6.172376e-02",
        "100, 3.241343e-02, 2.170921e-02",
    })
    void thousandPointSetMatchesNistTable(int m, double oadev, double mdev) {
        double[] x = thousandPointPhase();
        assertThat(AllanDeviation.overlapping(x, 1, m).deviation()).isCloseTo(oadev, rel(oadev));
        assertThat(AllanDeviation.modified(x, 1, m).deviation()).isCloseTo(mdev, rel(mdev));
    }

    @Test
    void overlappingAtTau0IsRmsOfFirstDifferencesOverRootTwo() {
        // Identity (derived, check-values.md): OADEV(tau0) = RMS(y[i+1] - y[i]) / sqrt(2) for frequency data.
        Random random = new Random(11);
        double[] y = new double[500];
        for (int i = 0; i < y.length; i++) {
            y[i] = random.nextGaussian();
        }
        double sum = 0;
        for (int i = 0; i + 1 < y.length; i++) {
            sum += (y[i + 1] - y[i]) * (y[i + 1] - y[i]);
        }
        double expected = Math.sqrt(sum / (y.length - 1)) / Math.sqrt(2);
        double[] x = PhaseData.fromFrequency(y, 1);
        assertThat(AllanDeviation.overlapping(x, 1, 1).deviation()).isCloseTo(expected, rel(expected));
    }

    @Test
    void stridedBetweenOverlappingAndNonOverlapping() {
        double[] x = thousandPointPhase();
        assertThat(AllanDeviation.strided(x, 1, 8, 1)).isEqualTo(AllanDeviation.overlapping(x, 1, 8));
        assertThat(AllanDeviation.strided(x, 1, 8, 8)).isEqualTo(AllanDeviation.nonOverlapping(x, 1, 8));
        // 1001 phase points, m = 8: second differences start at 0, 2, ..., 984 -> 493 terms.
        assertThat(AllanDeviation.strided(x, 1, 8, 2).terms()).isEqualTo(493);
    }

    @Test
    void tooShortDataGivesNaNWithNoTerms() {
        double[] x = {0, 1, 2};
        assertThat(AllanDeviation.overlapping(x, 1, 2).deviation()).isNaN();
        assertThat(AllanDeviation.modified(x, 1, 2).deviation()).isNaN();
        assertThat(HadamardDeviation.overlapping(x, 1, 1).terms()).isZero();
        assertThat(TotalDeviation.of(x, 1, 2).deviation()).isNaN();
    }

    @Test
    void tauScalesWithTau0() {
        StabilityPoint p = AllanDeviation.overlapping(nbsPhase(), 0.5, 2);
        assertThat(p.tauSeconds()).isEqualTo(1.0);
    }

    @Test
    void rejectsBadArguments() {
        assertThatThrownBy(() -> AllanDeviation.overlapping(new double[4], 0, 1))
                .hasMessage("tau0Seconds <= 0: 0.0");
        assertThatThrownBy(() -> AllanDeviation.overlapping(new double[4], 1, 0)).hasMessage("m < 1: 0");
    }

    @Test
    void octavesKeepEnoughPoints() {
        assertThat(PhaseData.octaves(1001, 4)).containsExactly(1, 2, 4, 8, 16, 32, 64, 128);
        assertThat(PhaseData.octaves(3, 4)).isEmpty();
    }

    @Test
    void frequencyAndPhaseRoundTrip() {
        double[] x = PhaseData.fromFrequency(NBS_Y, 2.0);
        assertThat(PhaseData.toFrequency(x, 2.0)).containsExactly(NBS_Y, within(1e-12));
    }
}
