package org.rcbench.measure;

import org.rcbench.edge.Timebase;

/**
 * The uncertainty budget of the least-squares frequency (GUM, JCGM 100:2008): statistical,
 * quantization and probe-clock components. Stateless.
 *
 * <h2>Statistical</h2>
 * The residuals of a timer's edges are not white: a 555's threshold noise makes each period
 * independent (white frequency noise, a random walk of phase), on top of white phase noise per
 * edge. The least-squares slope's variance is {@code 12 s^2 / (N (N^2-1))} for white phase noise
 * alone (Rubiola, Rev. Sci. Instrum. 76, 054703, 2005), but about {@code 1.2 sigma^2 / N} for white
 * frequency noise, so using residuals alone would understate it by roughly {@code sqrt(N)}. Both
 * levels are estimated from the octave Allan variance: the mean squared second difference at lag
 * {@code m} is {@code 2 m sigma_f^2 + 6 sigma_w^2} (derived), fitted by weighted least squares over
 * the octaves (weights: equivalent terms over the square of the value). Then
 * {@code var(b) = (sigma_w^2 Sxx + sigma_f^2 W) / Sxx^2} with {@code W} from
 * {@link FrequencyFit#randomWalkSum(long)}. Flicker noise is not modelled.
 *
 * <h2>Quantization</h2>
 * A timestamp is off by up to one tick {@code q}: variance {@code q^2/12} per edge and {@code q^2/6}
 * per period, but only while timing noise decorrelates successive errors. The rule: the errors are
 * taken as decorrelated when the period readings spread by at least one tick (standard deviation).
 * Then the quantization share {@code (q^2/12) / Sxx} is reported as its own component (it is
 * inside the statistical estimate and is taken out of it). Otherwise a clean period may read the
 * same every cycle and nothing averages: the floor is one uniform tick error at each end of the
 * span, {@code q / (sqrt(6) (N-1))} on the period (the plus-or-minus one count of a reciprocal
 * counter), and no further gain is claimed. (Given identical readings and a flat prior, the true
 * period is triangular over plus or minus {@code q/(N-1)}, whose standard deviation is exactly this.)
 *
 * <h2>Probe clock</h2>
 * {@code u_rel = Timebase.tolerancePpm() * 1e-6}, after the known offset has been applied.
 */
final class NoiseBudget {
    private NoiseBudget() {
    }

    /** White phase (index 0) and white frequency (index 1) noise variances in ticks squared. */
    static double[] noiseLevels(StreamingAllan allan) {
        int octaves = allan.octaves();
        double s11 = 0;
        double s12 = 0;
        double s22 = 0;
        double t1 = 0;
        double t2 = 0;
        boolean any = false;
        double smallest = Double.POSITIVE_INFINITY;
        for (int k = 0; k < octaves; k++) {
            double d = allan.meanSquare(k);
            if (d > 0) {
                smallest = Math.min(smallest, d);
            }
        }
        if (smallest == Double.POSITIVE_INFINITY) {
            return new double[] {0, 0};
        }
        for (int k = 0; k < octaves; k++) {
            double edf = allan.equivalentTerms(k);
            if (edf < 1) {
                continue;
            }
            double d = allan.meanSquare(k);
            double scale = Math.max(d, smallest);
            double w = edf / (scale * scale);
            double x1 = 2.0 * (1L << k);
            double x2 = 6.0;
            s11 += w * x1 * x1;
            s12 += w * x1 * x2;
            s22 += w * x2 * x2;
            t1 += w * x1 * d;
            t2 += w * x2 * d;
            any = true;
        }
        if (!any) {
            return new double[] {0, 0};
        }
        double det = s11 * s22 - s12 * s12;
        double white = 0;
        double walk = 0;
        if (det > 1e-12 * s11 * s22) {
            walk = (t1 * s22 - t2 * s12) / det;
            white = (s11 * t2 - s12 * t1) / det;
        }
        if (det <= 1e-12 * s11 * s22) {
            // One octave only: attribute it all to white frequency noise, the larger slope variance.
            walk = t1 / s11;
            white = 0;
        } else if (walk < 0) {
            walk = 0;
            white = t2 / s22;
        } else if (white < 0) {
            white = 0;
            walk = t1 / s11;
        }
        return new double[] {Math.max(0, white), Math.max(0, walk)};
    }

    static Measurement.FrequencyEstimate estimate(FrequencyFit.Result fit, StreamingAllan allan,
            double periodStdDevTicks, Timebase timebase) {
        double b = fit.slopeTicks();
        double tps = timebase.ticksPerSecond();
        if (!(b > 0)) {
            return new Measurement.FrequencyEstimate(Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, Double.NaN, 2, false, Double.NaN, Double.NaN, Double.NaN);
        }
        double f = tps / b;
        double[] levels = noiseLevels(allan);
        double sxx = fit.sxx();
        double slopeVar = allan.octaves() == 0 ? Double.NaN
                : (levels[0] * sxx + levels[1] * fit.randomWalkSum()) / (sxx * sxx);
        boolean decorrelated = periodStdDevTicks >= 1;
        double quantVar;
        double statVar;
        if (decorrelated) {
            quantVar = (1.0 / 12) / sxx;
            statVar = Math.max(0, slopeVar - quantVar);
        } else {
            quantVar = fit.floorVariance();
            statVar = slopeVar;
        }
        double statHz = f * Math.sqrt(statVar) / b;
        double quantHz = f * Math.sqrt(quantVar) / b;
        double clockHz = f * timebase.tolerancePpm() * 1e-6;
        double combined = Math.sqrt(statHz * statHz + quantHz * quantHz + clockHz * clockHz);
        double period = b / tps;
        return new Measurement.FrequencyEstimate(f, period, statHz, quantHz, clockHz, combined, 2 * combined, 2,
                decorrelated, Math.sqrt(levels[0]) / tps, Math.sqrt(levels[1]) / tps, period * combined / f);
    }
}
