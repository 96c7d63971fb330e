package org.rcbench.json;

import static org.rcbench.json.JsonNumbers.band;
import static org.rcbench.json.JsonNumbers.number;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.tolerance.Band;
import org.rcbench.tolerance.Prediction;

/**
 * The {@code predict --json} object. Stable keys (never renamed): {@code nominal} with
 * {@code frequency_hz}, {@code period_s}, {@code high_s}, {@code low_s}, {@code duty},
 * {@code first_high_s}; {@code worst_case} and {@code statistical} with each of those as
 * {@code [low, high]} (statistical: Monte Carlo 2.5 % and 97.5 %); {@code oscillates};
 * {@code reason}; {@code warnings}. Added keys: {@code pulse_width_s} (monostables, in all three
 * tables), {@code standard_uncertainty} (GUM, per quantity), {@code runs}, {@code may_stop},
 * {@code thresholds} {@code {upper_v, lower_v}}, {@code monte_carlo} {@code {draws, seed, stopped}},
 * {@code design}, {@code board}, {@code topology}, {@code family}, {@code supply_v}. A quantity the
 * topology does not have, or a number that is not finite, is {@code null}.
 */
public final class PredictionJson {
    /** The six quantities every prediction object carries, in order. */
    public static final List<TimingQuantity> REQUIRED = List.of(TimingQuantity.FREQUENCY, TimingQuantity.PERIOD,
            TimingQuantity.HIGH, TimingQuantity.LOW, TimingQuantity.DUTY, TimingQuantity.FIRST_HIGH);

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private PredictionJson() {
    }

    /** The prediction as a JSON tree. */
    public static ObjectNode toJson(Prediction p) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("design", p.design().source());
        root.put("board", p.design().title());
        root.put("topology", p.design().circuit().topology().fileName());
        root.put("family", p.design().circuit().family().fileName());
        number(root, "supply_v", p.design().circuit().supplyVolts());
        List<TimingQuantity> keys = quantities(p);
        ObjectNode nominal = root.putObject("nominal");
        ObjectNode worst = root.putObject("worst_case");
        ObjectNode stat = root.putObject("statistical");
        ObjectNode u = root.putObject("standard_uncertainty");
        for (TimingQuantity q : keys) {
            boolean has = p.quantities().contains(q);
            number(nominal, q.jsonKey(), has ? p.nominal(q) : Double.NaN);
            band(worst, q.jsonKey(), has ? p.worstCase(q) : Band.NONE);
            band(stat, q.jsonKey(), has ? p.statistical(q) : Band.NONE);
            Double su = p.standardUncertainty().get(q);
            number(u, q.jsonKey(), has && su != null ? su : Double.NaN);
        }
        root.put("oscillates", p.oscillates());
        root.put("runs", p.runs());
        if (p.reason() == null) {
            root.putNull("reason");
        } else {
            root.put("reason", p.reason());
        }
        root.put("may_stop", p.worstCaseMayStop());
        ObjectNode th = root.putObject("thresholds");
        number(th, "upper_v", p.upperVolts());
        number(th, "lower_v", p.lowerVolts());
        ObjectNode mc = root.putObject("monte_carlo");
        mc.put("draws", p.monteCarlo().draws());
        mc.put("seed", p.monteCarlo().seed());
        mc.put("stopped", p.monteCarlo().stopped());
        ArrayNode w = root.putArray("warnings");
        for (String s : p.warnings()) {
            w.add(s);
        }
        return root;
    }

    /** The prediction as indented JSON text. */
    public static String write(Prediction p) {
        try {
            return MAPPER.writeValueAsString(toJson(p));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    private static List<TimingQuantity> quantities(Prediction p) {
        if (p.quantities().contains(TimingQuantity.PULSE_WIDTH)) {
            List<TimingQuantity> l = new java.util.ArrayList<>(REQUIRED);
            l.add(TimingQuantity.PULSE_WIDTH);
            return l;
        }
        return REQUIRED;
    }
}
