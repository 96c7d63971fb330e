package org.rcbench.json;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.rcbench.measure.BistableMeter.BistableResult;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MonostableMeter.MonostableResult;
import org.rcbench.stability.StabilityPoint;

/**
 * The JSON object of a {@link Measurement}, in SI units (seconds, hertz, ppm per second).
 *
 * <p>Stable keys (never renamed; other tools parse them): {@code cycles}, {@code frequency_hz},
 * {@code frequency_u_hz} (expanded, k = 2), {@code period_s}, {@code high_s}, {@code low_s},
 * {@code duty}, {@code period_jitter_rms_s}, {@code period_jitter_pp_s},
 * {@code cycle_to_cycle_rms_s}, {@code cycle_to_cycle_max_s}, {@code tie_rms_s}, {@code mtie_s},
 * {@code allan} (array of {@code {"tau_s", "adev"}}), {@code drift_ppm_per_s},
 * {@code settling_cycles}, {@code glitches}, {@code gaps}; with a monostable, {@code pulse_width_s}
 * and {@code delay_s}. Further keys add detail. A figure that could not be measured is
 * {@code null}. Stateless and thread-safe.
 */
public final class MeasurementJson {
    private static final JsonNodeFactory F = JsonNodeFactory.instance;
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private MeasurementJson() {
    }

    /** The measurement as a JSON object. */
    public static ObjectNode of(Measurement m) {
        ObjectNode o = F.objectNode();
        o.put("channel", m.channel());
        o.put("cycles", m.cycles());
        Measurement.FrequencyEstimate f = m.frequency();
        put(o, "frequency_hz", f.frequencyHz());
        put(o, "frequency_u_hz", f.expandedHz());
        put(o, "period_s", f.periodSeconds());
        put(o, "high_s", m.high().meanSeconds());
        put(o, "low_s", m.low().meanSeconds());
        put(o, "duty", m.duty());
        Measurement.Jitter j = m.jitter();
        put(o, "period_jitter_rms_s", j.periodRmsSeconds());
        put(o, "period_jitter_pp_s", j.periodPeakToPeakSeconds());
        put(o, "cycle_to_cycle_rms_s", j.cycleToCycleRmsSeconds());
        put(o, "cycle_to_cycle_max_s", j.cycleToCycleMaxSeconds());
        put(o, "tie_rms_s", m.timeError().tieRmsSeconds());
        put(o, "mtie_s", m.timeError().mtieSeconds());
        ArrayNode allan = o.putArray("allan");
        for (StabilityPoint p : m.allan()) {
            ObjectNode point = allan.addObject();
            put(point, "tau_s", p.tauSeconds());
            put(point, "adev", p.deviation());
            point.put("terms", p.terms());
        }
        put(o, "drift_ppm_per_s", m.drift().ppmPerSecond());
        o.put("settling_cycles", m.irregularities().settlingCycles());
        o.put("glitches", m.irregularities().glitches());
        o.put("gaps", m.irregularities().gaps());

        o.put("edges", m.edges());
        put(o, "span_s", m.spanSeconds());
        ObjectNode u = o.putObject("frequency_uncertainty");
        put(u, "statistical_hz", f.statisticalHz());
        put(u, "quantization_hz", f.quantizationHz());
        put(u, "clock_hz", f.clockHz());
        put(u, "combined_hz", f.combinedHz());
        put(u, "expanded_hz", f.expandedHz());
        put(u, "coverage_factor", f.coverageFactor());
        u.put("quantization_decorrelated", f.quantizationDecorrelated());
        put(u, "white_phase_noise_s", f.whitePhaseNoiseSeconds());
        put(u, "white_frequency_noise_s", f.whiteFrequencyNoiseSeconds());
        o.set("period", times(m.period()));
        o.set("high", times(m.high()));
        o.set("low", times(m.low()));
        put(o, "duty_u", m.dutyStandardUncertainty());
        ObjectNode q = o.putObject("jitter_quantization");
        put(q, "per_period_s", j.quantizationPerPeriodSeconds());
        put(q, "period_jitter_rms_corrected_s", j.periodRmsCorrectedSeconds());
        q.put("period_correction_clamped", j.periodCorrectionClamped());
        put(q, "cycle_to_cycle_rms_corrected_s", j.cycleToCycleRmsCorrectedSeconds());
        q.put("cycle_to_cycle_correction_clamped", j.cycleToCycleCorrectionClamped());
        ArrayNode mtie = o.putArray("mtie_windows");
        for (Measurement.MtiePoint p : m.timeError().windows()) {
            ObjectNode point = mtie.addObject();
            point.put("cycles", p.windowCycles());
            put(point, "window_s", p.windowSeconds());
            put(point, "mtie_s", p.mtieSeconds());
        }
        o.put("mtie_resolution_cycles", m.timeError().resolutionCycles());
        ObjectNode d = o.putObject("drift");
        d.put("warm_up", m.drift().warmUp());
        d.put("settled_at_cycle", m.drift().settledAtCycle());
        put(d, "settled_ppm_per_s", m.drift().settledPpmPerSecond());
        Measurement.Irregularities irr = m.irregularities();
        o.put("stalls", irr.stalls());
        put(o, "stalled_s", irr.stalledSeconds());
        o.put("missed_edges", irr.missedEdges());
        o.put("segments", irr.segments());
        ArrayNode w = o.putArray("warnings");
        m.warnings().forEach(w::add);
        return o;
    }

    /** Adds a monostable's figures: {@code pulse_width_s}, {@code delay_s} and a {@code monostable} object. */
    public static ObjectNode addMonostable(ObjectNode o, MonostableResult r) {
        put(o, "pulse_width_s", r.pulseWidth().meanSeconds());
        put(o, "delay_s", r.delay().meanSeconds());
        ObjectNode mono = o.putObject("monostable");
        mono.put("triggers", r.triggers());
        mono.put("pulses", r.pulses());
        mono.put("ignored_triggers", r.ignoredTriggers());
        mono.put("untriggered_pulses", r.untriggeredPulses());
        mono.put("gaps", r.gaps());
        mono.set("pulse_width", times(r.pulseWidth()));
        mono.set("delay", times(r.delay()));
        return o;
    }

    /** Adds a latch's figures as a {@code bistable} object ({@code set_response_s}, {@code reset_response_s}, bounces). */
    public static ObjectNode addBistable(ObjectNode o, BistableResult r) {
        ObjectNode b = o.putObject("bistable");
        put(b, "set_response_s", r.setResponse().meanSeconds());
        put(b, "reset_response_s", r.resetResponse().meanSeconds());
        b.put("set_presses", r.setPresses());
        b.put("reset_presses", r.resetPresses());
        b.put("set_bounces", r.setBounces());
        b.put("reset_bounces", r.resetBounces());
        b.put("no_change", r.noChange());
        b.put("spontaneous", r.spontaneous());
        b.put("gaps", r.gaps());
        b.set("set_response", times(r.setResponse()));
        b.set("reset_response", times(r.resetResponse()));
        return o;
    }

    /** Pretty-printed JSON text. */
    public static String write(ObjectNode o) {
        try {
            return MAPPER.writeValueAsString(o);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("JSON tree cannot be written: " + e.getMessage(), e);
        }
    }

    private static ObjectNode times(Measurement.TimeStats t) {
        ObjectNode o = F.objectNode();
        o.put("count", t.count());
        put(o, "mean_s", t.meanSeconds());
        put(o, "sd_s", t.stdDevSeconds());
        put(o, "min_s", t.minSeconds());
        put(o, "max_s", t.maxSeconds());
        put(o, "u_s", t.standardUncertaintySeconds());
        return o;
    }

    private static void put(ObjectNode o, String key, double value) {
        if (Double.isFinite(value)) {
            o.put(key, value);
        } else {
            o.putNull(key);
        }
    }
}
