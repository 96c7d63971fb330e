package org.rcbench.json;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.rcbench.tolerance.Band;

/**
 * How rcbench's JSON documents write numbers: a figure that is not finite (not measured, none
 * intended) is {@code null}, never a non-standard {@code NaN} or {@code Infinity}; a band is
 * {@code [low, high]} or {@code null}. Stateless.
 */
public final class JsonNumbers {
    private JsonNumbers() {
    }

    /** Puts {@code v} under {@code key}, or null when it is not finite. */
    public static void number(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    /** Puts {@code [low, high]} under {@code key}, or null when the band is not defined or an end is not finite. */
    public static void band(ObjectNode o, String key, Band b) {
        if (!b.isDefined() || !Double.isFinite(b.low()) || !Double.isFinite(b.high())) {
            o.putNull(key);
            return;
        }
        ArrayNode a = o.putArray(key);
        a.add(b.low());
        a.add(b.high());
    }
}
