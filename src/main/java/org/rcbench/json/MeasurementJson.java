package org.rcbench.json;

import static org.rcbench.json.JsonNumbers.number;

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
        number(o, "frequency_hz", f.frequencyHz());
        number(o, "frequency_u_hz", f.expandedHz());
        number(o, "period_s", f.periodSeconds());
        number(o, "high_s", m.high().meanSeconds());
        number(o, "low_s", m.low().meanSeconds());
        number(o, "duty", m.duty());
        Measurement.Jitter j = m.jitter();
        number(o, "period_jitter_rms_s", j.periodRmsSeconds());
        number(o, "period_jitter_pp_s", j.periodPeakToPeakSeconds());
        number(o, "cycle_to_cycle_rms_s", j.cycleToCycleRmsSeconds());
        number(o, "cycle_to_cycle_max_s", j.cycleToCycleMaxSeconds());
        number(o, "tie_rms_s", m.timeError().tieRmsSeconds());
        number(o, "mtie_s", m.timeError().mtieSeconds());
        ArrayNode allan = o.putArray("allan");
        for (StabilityPoint p : m.allan()) {
            ObjectNode point = allan.addObject();
            number(point, "tau_s", p.tauSeconds());
            number(point, "adev", p.deviation());
            point.put("terms", p.terms());
        }
        number(o, "drift_ppm_per_s", m.drift().ppmPerSecond());
        o.put("settling_cycles", m.irregularities().settlingCycles());
        o.put("glitches", m.irregularities().glitches());
        o.put("gaps", m.irregularities().gaps());

        o.put("edges", m.edges());
        number(o, "span_s", m.spanSeconds());
        ObjectNode u = o.putObject("frequency_uncertainty");
        number(u, "statistical_hz", f.statisticalHz());
        number(u, "quantization_hz", f.quantizationHz());
        number(u, "clock_hz", f.clockHz());
        number(u, "combined_hz", f.combinedHz());
        number(u, "expanded_hz", f.expandedHz());
        number(u, "coverage_factor", f.coverageFactor());
        u.put("quantization_decorrelated", f.quantizationDecorrelated());
        number(u, "white_phase_noise_s", f.whitePhaseNoiseSeconds());
        number(u, "white_frequency_noise_s", f.whiteFrequencyNoiseSeconds());
        o.set("period", times(m.period()));
        o.set("high", times(m.high()));
        o.set("low", times(m.low()));
        number(o, "duty_u", m.dutyStandardUncertainty());
        ObjectNode q = o.putObject("jitter_quantization");
        number(q, "per_period_s", j.quantizationPerPeriodSeconds());
        number(q, "period_jitter_rms_corrected_s", j.periodRmsCorrectedSeconds());
        q.put("period_correction_clamped", j.periodCorrectionClamped());
        number(q, "cycle_to_cycle_rms_corrected_s", j.cycleToCycleRmsCorrectedSeconds());
        q.put("cycle_to_cycle_correction_clamped", j.cycleToCycleCorrectionClamped());
        ArrayNode mtie = o.putArray("mtie_windows");
        for (Measurement.MtiePoint p : m.timeError().windows()) {
            ObjectNode point = mtie.addObject();
            point.put("cycles", p.windowCycles());
            number(point, "window_s", p.windowSeconds());
            number(point, "mtie_s", p.mtieSeconds());
        }
        o.put("mtie_resolution_cycles", m.timeError().resolutionCycles());
        ObjectNode d = o.putObject("drift");
        d.put("warm_up", m.drift().warmUp());
        d.put("settled_at_cycle", m.drift().settledAtCycle());
        number(d, "settled_ppm_per_s", m.drift().settledPpmPerSecond());
        Measurement.Irregularities irr = m.irregularities();
        o.put("stalls", irr.stalls());
        number(o, "stalled_s", irr.stalledSeconds());
        o.put("missed_edges", irr.missedEdges());
        o.put("segments", irr.segments());
        ArrayNode w = o.putArray("warnings");
        m.warnings().forEach(w::add);
        return o;
    }

    /** Adds a monostable's figures: {@code pulse_width_s}, {@code delay_s} and a {@code monostable} object. */
    public static ObjectNode addMonostable(ObjectNode o, MonostableResult r) {
        number(o, "pulse_width_s", r.pulseWidth().meanSeconds());
        number(o, "delay_s", r.delay().meanSeconds());
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
        number(b, "set_response_s", r.setResponse().meanSeconds());
        number(b, "reset_response_s", r.resetResponse().meanSeconds());
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
        number(o, "mean_s", t.meanSeconds());
        number(o, "sd_s", t.stdDevSeconds());
        number(o, "min_s", t.minSeconds());
        number(o, "max_s", t.maxSeconds());
        number(o, "u_s", t.standardUncertaintySeconds());
        return o;
    }
}
