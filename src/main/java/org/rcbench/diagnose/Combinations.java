package org.rcbench.diagnose;

import java.util.List;
import org.rcbench.circuit.CircuitSpec;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.Role;
import org.rcbench.circuit.TimingQuantity;

/**
 * The combination of parts each timing quantity is proportional to in the ideal circuit, written
 * with the board's designators: {@code R1·C1} for a monostable's pulse width, {@code (R1+R2)·C1} for
 * an astable's high time, {@code (R1+2R2)·C1} for its period. These are the first-order RC laws of
 * check-values.md; the numbers rcbench reports always come from the full model, the expressions only
 * name what a measured quantity pins down. Stateless.
 */
final class Combinations {
    private Combinations() {
    }

    /** The expression for {@code q} in {@code spec}'s topology, or null when it has none. */
    static String of(CircuitSpec spec, TimingQuantity q) {
        String c = sum(spec.withRole(Role.TIMING), "");
        switch (spec.topology()) {
            case MONOSTABLE:
                return q == TimingQuantity.PULSE_WIDTH || q == TimingQuantity.HIGH ? times(sum(spec, Role.CHARGE), c) : null;
            case ASTABLE: {
                String ra = sum(spec, Role.CHARGE);
                String rb = sum(spec, Role.SHARED);
                return freeRunning(q, "(" + ra + "+" + rb + ")·" + c, times(rb, c),
                        "(" + ra + "+2" + rb + ")·" + c);
            }
            case ASTABLE_ONE_DIODE: {
                String ra = sum(spec, Role.CHARGE);
                String rb = sum(spec, Role.SHARED);
                return freeRunning(q, times(ra, c), times(rb, c), "(" + ra + "+" + rb + ")·" + c);
            }
            case ASTABLE_TWO_DIODE: {
                String ra = sum(spec, Role.CHARGE);
                String rb = sum(spec, Role.DISCHARGE);
                return freeRunning(q, times(ra, c), times(rb, c), "(" + ra + "+" + rb + ")·" + c);
            }
            case OUTPUT_FED: {
                String r = times(sum(spec, Role.FEEDBACK), c);
                return freeRunning(q, r, r, r);
            }
            case PWM_POT: {
                String r1 = sum(spec, Role.CHARGE);
                String pot = sum(spec, Role.SPLIT_POT);
                List<Element> end = spec.withRole(Role.DISCHARGE);
                String r2 = end.isEmpty() ? "" : "+" + sum(end, "");
                return freeRunning(q, "(" + r1 + "+w·" + pot + ")·" + c, "((1−w)·" + pot + r2 + ")·" + c,
                        "(" + r1 + "+" + pot + r2 + ")·" + c);
            }
            default:
                return null;
        }
    }

    private static String freeRunning(TimingQuantity q, String high, String low, String period) {
        switch (q) {
            case HIGH: return high;
            case LOW: return low;
            case PERIOD:
            case FREQUENCY:
                return period;
            default: return null;
        }
    }

    private static String sum(CircuitSpec spec, Role role) {
        return sum(spec.withRole(role), "");
    }

    /** Designators joined with '+', bracketed when there are several. */
    private static String sum(List<Element> parts, String none) {
        if (parts.isEmpty()) {
            return none;
        }
        if (parts.size() == 1) {
            return parts.get(0).designator();
        }
        StringBuilder sb = new StringBuilder("(");
        for (Element e : parts) {
            sb.append(sb.length() == 1 ? "" : "+").append(e.designator());
        }
        return sb.append(')').toString();
    }

    private static String times(String a, String b) {
        return a + "·" + b;
    }
}
