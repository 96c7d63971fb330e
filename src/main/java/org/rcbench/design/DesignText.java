package org.rcbench.design;

import java.util.Locale;
import org.rcbench.circuit.CircuitSpec;
import org.rcbench.circuit.ControlPin;
import org.rcbench.circuit.DiodeLaw;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.ElementType;
import org.rcbench.circuit.FamilyParameters;
import org.rcbench.circuit.PartKind;
import org.rcbench.circuit.Role;
import org.rcbench.units.Tolerance;
import org.rcbench.units.Unit;
import org.rcbench.units.ValueCode;

/**
 * Writes a {@link Design} as a design file that {@link DesignReader} reads back to the same design
 * (values to six significant digits; family parameters only where they differ from the family's
 * defaults). Thread-safe.
 */
public final class DesignText {
    private DesignText() {
    }

    public static String toToml(Design d) {
        StringBuilder sb = new StringBuilder();
        CircuitSpec c = d.circuit();
        sb.append("rcbench_design = 1\n\n[board]\n");
        kv(sb, "name", d.boardName());
        if (!d.revision().isEmpty()) {
            kv(sb, "revision", d.revision());
        }
        if (!d.notes().isEmpty()) {
            kv(sb, "notes", d.notes());
        }
        sb.append("\n[timer]\n");
        kv(sb, "topology", c.topology().fileName());
        kv(sb, "family", c.family().fileName());
        kv(sb, "supply", ValueCode.formatSi(c.supplyVolts(), Unit.VOLT, 6));
        if (!d.supplyTolerance().equals(Tolerance.NONE)) {
            kv(sb, "supply_tolerance", tol(d.supplyTolerance()));
        }
        if (d.ambient() != null) {
            sb.append(String.format(Locale.ROOT, "ambient_c = [%s, %s]%n", plain(d.ambient().minCelsius()),
                    plain(d.ambient().maxCelsius())));
            if (d.ambient().referenceCelsius() != Ambient.DEFAULT_REFERENCE_CELSIUS) {
                sb.append("reference_c = ").append(plain(d.ambient().referenceCelsius())).append('\n');
            }
        }
        family(sb, c.familyParameters(), c.family().defaults());
        ControlPin cp = c.control();
        sb.append("\n[control]\n");
        kv(sb, "pin", cp.mode().fileName());
        if (cp.mode() == ControlPin.Mode.DRIVEN) {
            kv(sb, "drive", ValueCode.formatSi(cp.driveVolts(), Unit.VOLT, 6));
            kv(sb, "drive_ohms", ValueCode.formatSi(cp.driveOhms(), Unit.OHM, 6));
        }
        if (!Double.isNaN(c.trigger().widthSeconds()) || !Double.isNaN(c.trigger().intervalSeconds())) {
            sb.append("\n[trigger]\n");
            if (!Double.isNaN(c.trigger().widthSeconds())) {
                kv(sb, "width", ValueCode.formatSi(c.trigger().widthSeconds(), Unit.SECOND, 6));
            }
            if (!Double.isNaN(c.trigger().intervalSeconds())) {
                kv(sb, "interval", ValueCode.formatSi(c.trigger().intervalSeconds(), Unit.SECOND, 6));
            }
        }
        for (Element e : c.elements()) {
            sb.append("\n[parts.").append(e.designator()).append("]\n");
            kv(sb, "role", e.role().fileName());
            PartSpread s = d.spread(e.designator());
            if (e.type() == ElementType.DIODE) {
                if (e.kind() != PartKind.UNSPECIFIED) {
                    kv(sb, "kind", e.kind().fileName());
                }
                double kindDrop = e.kind() == PartKind.SILICON ? DiodeLaw.siliconDropVolts()
                        : e.kind() == PartKind.SCHOTTKY ? DiodeLaw.schottkyDropVolts() : Double.NaN;
                if (e.value() != kindDrop) {
                    kv(sb, "drop", ValueCode.formatSi(e.value(), Unit.VOLT, 6));
                }
                if (s.tolerance().plusFraction() > 0) {
                    kv(sb, "drop_tolerance", ValueCode.formatSi(s.tolerance().plusFraction() * e.value(), Unit.VOLT, 6));
                }
            } else {
                kv(sb, "value", ValueCode.format(e.value(), e.type().unit(), 6));
                if (!s.tolerance().equals(Tolerance.NONE) || e.role() != Role.OTHER && e.role() != Role.CONTROL_BYPASS) {
                    kv(sb, "tolerance", tol(s.tolerance()));
                }
                if (e.kind() != PartKind.UNSPECIFIED) {
                    kv(sb, "kind", e.kind().fileName());
                }
                if (e.type() == ElementType.POTENTIOMETER) {
                    sb.append("wiper = ").append(plain(e.wiper())).append('\n');
                    if (d.travel(e.designator()) != null) {
                        kv(sb, "travel", d.travel(e.designator()).text());
                    }
                }
                if (s.tempco() != null && !(e.kind() == PartKind.C0G && s.tempco().equals(Tempco.C0G))) {
                    kv(sb, "tempco", s.tempco().halfWidthPpmPerKelvin() == 0
                            ? plain(s.tempco().centreppmPerKelvin()) + " ppm/K"
                            : plain(s.tempco().centreppmPerKelvin()) + " ±" + plain(s.tempco().halfWidthPpmPerKelvin()) + " ppm/K");
                }
            }
            if (s.distribution() != Distribution.RECTANGULAR) {
                kv(sb, "distribution", s.distribution().fileName());
            }
        }
        return sb.toString();
    }

    private static void family(StringBuilder sb, FamilyParameters f, FamilyParameters d) {
        StringBuilder t = new StringBuilder();
        over(t, "divider", f.dividerOhms(), d.dividerOhms(), Unit.OHM);
        over(t, "output_high_drop", f.outputHighDropVolts(), d.outputHighDropVolts(), Unit.VOLT);
        over(t, "output_high_ohms", f.outputHighOhms(), d.outputHighOhms(), Unit.OHM);
        over(t, "output_low", f.outputLowVolts(), d.outputLowVolts(), Unit.VOLT);
        over(t, "output_low_ohms", f.outputLowOhms(), d.outputLowOhms(), Unit.OHM);
        over(t, "discharge_sat", f.dischargeSatVolts(), d.dischargeSatVolts(), Unit.VOLT);
        over(t, "discharge_ohms", f.dischargeOhms(), d.dischargeOhms(), Unit.OHM);
        over(t, "input_current", f.inputCurrentAmps(), d.inputCurrentAmps(), Unit.AMPERE);
        over(t, "delay", f.delaySeconds(), d.delaySeconds(), Unit.SECOND);
        over(t, "supply_min", f.minSupplyVolts(), d.minSupplyVolts(), Unit.VOLT);
        over(t, "supply_max", f.maxSupplyVolts(), d.maxSupplyVolts(), Unit.VOLT);
        if (t.length() > 0) {
            sb.append("\n[family]\n").append(t);
        }
    }

    private static void over(StringBuilder sb, String key, double v, double def, Unit unit) {
        if (v != def) {
            kv(sb, key, v == 0 ? "0" : ValueCode.formatSi(v, unit, 6));
        }
    }

    private static String tol(Tolerance t) {
        String pct = t.toString().replace(" %", "%");
        return t.isSymmetric() ? pct.substring(1) : pct;
    }

    private static String plain(double v) {
        return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    private static void kv(StringBuilder sb, String key, String value) {
        sb.append(key).append(" = \"").append(value.replace("\\", "\\\\").replace("\"", "\\\"")).append("\"\n");
    }
}
