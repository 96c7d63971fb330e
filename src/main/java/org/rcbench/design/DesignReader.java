package org.rcbench.design;

import com.fasterxml.jackson.core.JacksonException;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.dataformat.toml.TomlMapper;
import com.fasterxml.jackson.dataformat.toml.TomlStreamReadException;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.rcbench.circuit.CircuitSpec;
import org.rcbench.circuit.ControlPin;
import org.rcbench.circuit.DiodeLaw;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.ElementType;
import org.rcbench.circuit.FamilyParameters;
import org.rcbench.circuit.PartKind;
import org.rcbench.circuit.Role;
import org.rcbench.circuit.TimerFamily;
import org.rcbench.circuit.Topology;
import org.rcbench.circuit.Trigger;
import org.rcbench.common.BadInputException;
import org.rcbench.units.CodedValue;
import org.rcbench.units.Tolerance;
import org.rcbench.units.Unit;
import org.rcbench.units.ValueCode;

/**
 * Reads an rcbench design file (TOML, see the README's "Design files") into a {@link Design}.
 *
 * <p>Every problem is a {@link BadInputException} whose one-line message names the file, the line
 * when known, the key path and what is wrong: {@code piper.toml:14: parts.R1.role: unknown role
 * "chrage" (one of ...)}. Unknown keys are errors too, so a misspelt key cannot be silently ignored.
 * Thread-safe (no state).
 */
public final class DesignReader {
    private static final TomlMapper TOML = new TomlMapper();
    private static final Set<String> TOP = Set.of("rcbench_design", "board", "timer", "family", "control", "trigger", "parts");
    private static final Set<String> BOARD = Set.of("name", "revision", "notes");
    private static final Set<String> TIMER = Set.of("topology", "family", "supply", "supply_tolerance", "ambient_c",
            "reference_c");
    private static final Set<String> FAMILY = Set.of("divider", "output_high_drop", "output_high_ohms", "output_low",
            "output_low_ohms", "discharge_sat", "discharge_ohms", "input_current", "delay", "supply_min", "supply_max");
    private static final Set<String> CONTROL = Set.of("pin", "drive", "drive_ohms");
    private static final Set<String> TRIGGER = Set.of("width", "interval");
    private static final Set<String> PART = Set.of("role", "value", "tolerance", "kind", "tempco", "distribution",
            "wiper", "travel", "drop", "drop_tolerance");

    private final String source;
    private final KeyLines lines;
    private final Map<String, PotTravel> travels = new LinkedHashMap<>();

    private DesignReader(String source, KeyLines lines) {
        this.source = source;
        this.lines = lines;
    }

    /** Reads the design file at {@code file}. */
    public static Design read(Path file) {
        String name = file.toString();
        String text;
        try {
            byte[] bytes = Files.readAllBytes(file);
            text = StandardCharsets.UTF_8.newDecoder().decode(java.nio.ByteBuffer.wrap(bytes)).toString();
        } catch (NoSuchFileException e) {
            throw new BadInputException(name, "no such file");
        } catch (CharacterCodingException e) {
            throw new BadInputException(name, "not UTF-8 text");
        } catch (IOException e) {
            throw new BadInputException(name, "cannot read: " + e.getMessage());
        }
        return parse(text, name);
    }

    /** Parses design text; {@code sourceName} is used in messages. */
    public static Design parse(String text, String sourceName) {
        JsonNode root;
        try {
            root = TOML.readTree(text);
        } catch (TomlStreamReadException e) {
            JsonLocation loc = e.getLocation();
            int line = loc == null ? 0 : loc.getLineNr();
            String msg = e.getOriginalMessage() == null ? "syntax error" : e.getOriginalMessage().replace('\n', ' ');
            throw new BadInputException(sourceName + (line > 0 ? ":" + line : ""), "not valid TOML: " + msg);
        } catch (JacksonException e) {
            throw new BadInputException(sourceName, "not valid TOML: " + e.getOriginalMessage());
        }
        if (root == null || !root.isObject()) {
            throw new BadInputException(sourceName, "empty design file");
        }
        return new DesignReader(sourceName, KeyLines.scan(text)).design(root);
    }

    private Design design(JsonNode root) {
        onlyKeys(root, "", TOP);
        JsonNode version = root.get("rcbench_design");
        if (version != null && !(version.isInt() && version.asInt() == 1)) {
            throw fail("rcbench_design", "this rcbench reads design format 1, not " + version.asText());
        }
        JsonNode board = table(root, "board", false);
        String name = board == null ? "" : string(board, "board.name", false);
        String revision = board == null ? "" : string(board, "board.revision", false);
        String notes = board == null ? "" : string(board, "board.notes", false);
        if (board != null) {
            onlyKeys(board, "board", BOARD);
        }
        if (name == null || name.isEmpty()) {
            name = Path.of(source).getFileName().toString().replaceFirst("\\.toml$", "");
        }
        JsonNode timer = table(root, "timer", true);
        onlyKeys(timer, "timer", TIMER);
        Topology topology = topology(timer);
        TimerFamily family = family(timer);
        double supply = positive(need(timer, "timer.supply"), "timer.supply", Unit.VOLT);
        Tolerance supplyTol = timer.has("supply_tolerance")
                ? tolerance(timer.get("supply_tolerance"), "timer.supply_tolerance") : Tolerance.NONE;
        Ambient ambient = ambient(timer);
        FamilyParameters fp = familyParameters(table(root, "family", false), family.defaults());

        Map<String, PartSpread> spreads = new LinkedHashMap<>();
        List<Element> elements = parts(table(root, "parts", topology != Topology.BISTABLE), topology, spreads);
        ControlPin control = control(table(root, "control", false), elements);
        Trigger trigger = trigger(table(root, "trigger", false), topology);
        requireRoles(topology, elements);
        CircuitSpec spec = new CircuitSpec(topology, family, fp, supply, elements, control, trigger);
        return new Design(source, name, revision, notes, spec, spreads, supplyTol, ambient, travels);
    }

    private Topology topology(JsonNode timer) {
        String t = string(timer, "timer.topology", true);
        Topology top = Topology.fromFileName(t);
        if (top == null) {
            throw fail("timer.topology", "unknown topology \"" + t + "\" (one of " + Topology.spellings() + ")");
        }
        return top;
    }

    private TimerFamily family(JsonNode timer) {
        String f = string(timer, "timer.family", true);
        TimerFamily fam = TimerFamily.fromFileName(f);
        if (fam == null) {
            throw fail("timer.family", "unknown timer family \"" + f + "\" (bipolar or cmos)");
        }
        return fam;
    }

    private Ambient ambient(JsonNode timer) {
        JsonNode a = timer.get("ambient_c");
        if (a == null) {
            return null;
        }
        if (!a.isArray() || a.size() != 2 || !a.get(0).isNumber() || !a.get(1).isNumber()) {
            throw fail("timer.ambient_c", "write the ambient range as two numbers in °C, e.g. [0, 40]");
        }
        double lo = a.get(0).asDouble();
        double hi = a.get(1).asDouble();
        if (!(lo <= hi) || lo < -273.15) {
            throw fail("timer.ambient_c", "the lower end must not exceed the upper end");
        }
        double ref = Ambient.DEFAULT_REFERENCE_CELSIUS;
        if (timer.has("reference_c")) {
            if (!timer.get("reference_c").isNumber()) {
                throw fail("timer.reference_c", "write the reference temperature as a number in °C");
            }
            ref = timer.get("reference_c").asDouble();
        }
        return new Ambient(lo, hi, ref);
    }

    private FamilyParameters familyParameters(JsonNode f, FamilyParameters d) {
        if (f == null) {
            return d;
        }
        onlyKeys(f, "family", FAMILY);
        return new FamilyParameters(
                opt(f, "divider", Unit.OHM, d.dividerOhms(), true),
                opt(f, "output_high_drop", Unit.VOLT, d.outputHighDropVolts(), false),
                opt(f, "output_high_ohms", Unit.OHM, d.outputHighOhms(), false),
                opt(f, "output_low", Unit.VOLT, d.outputLowVolts(), false),
                opt(f, "output_low_ohms", Unit.OHM, d.outputLowOhms(), false),
                opt(f, "discharge_sat", Unit.VOLT, d.dischargeSatVolts(), false),
                opt(f, "discharge_ohms", Unit.OHM, d.dischargeOhms(), false),
                opt(f, "input_current", Unit.AMPERE, d.inputCurrentAmps(), false),
                opt(f, "delay", Unit.SECOND, d.delaySeconds(), false),
                opt(f, "supply_min", Unit.VOLT, d.minSupplyVolts(), false),
                opt(f, "supply_max", Unit.VOLT, d.maxSupplyVolts(), true),
                d.maxInputCurrentAmps(), d.practicalMaxHz());
    }

    private double opt(JsonNode table, String key, Unit unit, double fallback, boolean strictlyPositive) {
        JsonNode n = table.get(key);
        if (n == null) {
            return fallback;
        }
        String path = "family." + key;
        double v = value(n, path, unit).value();
        if (strictlyPositive ? !(v > 0) : !(v >= 0)) {
            throw fail(path, "\"" + n.asText() + "\" must be " + (strictlyPositive ? "above zero" : "zero or more"));
        }
        return v;
    }

    private List<Element> parts(JsonNode parts, Topology topology, Map<String, PartSpread> spreads) {
        List<Element> out = new ArrayList<>();
        if (parts == null) {
            return out;
        }
        for (Iterator<Map.Entry<String, JsonNode>> it = parts.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            String designator = e.getKey();
            String path = "parts." + designator;
            if (designator.isEmpty() || designator.contains(".") || designator.contains(" ")) {
                throw fail(path, "a designator must be one word without dots, e.g. R3");
            }
            if (!e.getValue().isObject()) {
                throw fail(path, "describe each part as a table: [parts." + designator + "] with role, value, tolerance");
            }
            out.add(part(designator, e.getValue(), path, topology, spreads));
        }
        return out;
    }

    private Element part(String designator, JsonNode p, String path, Topology topology, Map<String, PartSpread> spreads) {
        onlyKeys(p, path, PART);
        String roleText = string(p, path + ".role", true);
        Role role = Role.fromFileName(roleText);
        if (role == null) {
            throw fail(path + ".role", "unknown role \"" + roleText + "\" (one of " + Role.spellings() + ")");
        }
        if (!topology.allows(role)) {
            throw fail(path + ".role", "role \"" + roleText + "\" has no place in " + article(topology.fileName()));
        }
        ElementType type = role.usualType();
        if (role == Role.OTHER) {
            // Parts outside the timing are listed for completeness: a C... designator is read as a capacitor.
            type = p.has("wiper") ? ElementType.POTENTIOMETER
                    : designator.startsWith("C") ? ElementType.CAPACITOR : ElementType.RESISTOR;
        } else if (type == ElementType.RESISTOR && p.has("wiper")) {
            type = ElementType.POTENTIOMETER;
        }
        PartKind kind = PartKind.UNSPECIFIED;
        if (p.has("kind")) {
            String k = string(p, path + ".kind", true);
            kind = PartKind.fromFileName(k);
            if (kind == null) {
                throw fail(path + ".kind", "unknown kind \"" + k + "\" (one of " + PartKind.spellings() + ")");
            }
            if (role != Role.OTHER && !kind.fits(type)) {
                throw fail(path + ".kind", "\"" + k + "\" is not a kind of " + type.name().toLowerCase(java.util.Locale.ROOT)
                        + ", which role " + role.fileName() + " needs");
            }
        }
        if (type == ElementType.DIODE) {
            return diode(designator, role, kind, p, path, spreads);
        }
        JsonNode valueNode = need(p, path + ".value");
        CodedValue cv = value(valueNode, path + ".value", type.unit());
        if (!(cv.value() > 0)) {
            throw fail(path + ".value", "\"" + valueNode.asText() + "\" is " + (cv.value() < 0 ? "negative" : "zero")
                    + ": a " + type.unit().quantityName() + " must be above zero");
        }
        double wiper = Double.NaN;
        if (type == ElementType.POTENTIOMETER) {
            wiper = wiper(need(p, path + ".wiper"), path + ".wiper");
        } else if (role == Role.SPLIT_POT) {
            throw fail(path + ".wiper", "missing: a split pot needs its wiper position (0 to 1)");
        }
        if (p.has("travel")) {
            if (type != ElementType.POTENTIOMETER) {
                throw fail(path + ".travel", "only a potentiometer (a part with a wiper) has a travel");
            }
            travels.put(designator, travel(p.get("travel"), path + ".travel"));
        }
        Tolerance tol = partTolerance(p, path, cv, role);
        Distribution dist = distribution(p, path);
        Tempco tc = null;
        if (p.has("tempco")) {
            tc = tempco(p.get("tempco"), path + ".tempco");
        } else if (kind == PartKind.C0G) {
            tc = Tempco.C0G;
        }
        spreads.put(designator, new PartSpread(tol, dist, tc));
        return new Element(designator, role, type, cv.value(), wiper, kind, null);
    }

    private Element diode(String designator, Role role, PartKind kind, JsonNode p, String path,
            Map<String, PartSpread> spreads) {
        for (String k : new String[] {"value", "wiper", "travel", "tempco", "tolerance"}) {
            if (p.has(k)) {
                throw fail(path + "." + k, "a diode takes kind (silicon or schottky) and/or drop, not " + k);
            }
        }
        Element e;
        if (p.has("drop") && kind == PartKind.UNSPECIFIED) {
            double drop = positive(p.get("drop"), path + ".drop", Unit.VOLT);
            e = Element.diode(designator, role, drop);
        } else if (kind == PartKind.SILICON || kind == PartKind.SCHOTTKY) {
            DiodeLaw law = kind == PartKind.SILICON ? DiodeLaw.silicon() : DiodeLaw.schottky();
            double drop = kind == PartKind.SILICON ? DiodeLaw.siliconDropVolts() : DiodeLaw.schottkyDropVolts();
            if (p.has("drop")) {
                drop = positive(p.get("drop"), path + ".drop", Unit.VOLT);
            }
            e = Element.diode(designator, role, drop, law, kind);
        } else {
            throw fail(path, "a diode needs kind = \"silicon\" or \"schottky\" (drop follows the current) or a fixed"
                    + " drop = \"0.6 V\"");
        }
        Tolerance tol = Tolerance.NONE;
        if (p.has("drop_tolerance")) {
            double dv = value(p.get("drop_tolerance"), path + ".drop_tolerance", Unit.VOLT).value();
            if (!(dv >= 0) || dv >= e.value()) {
                throw fail(path + ".drop_tolerance", "must be zero or more and less than the drop");
            }
            tol = Tolerance.symmetric(dv / e.value());
        }
        spreads.put(designator, new PartSpread(tol, distribution(p, path), null));
        return e;
    }

    private Tolerance partTolerance(JsonNode p, String path, CodedValue cv, Role role) {
        if (p.has("tolerance")) {
            Tolerance t = tolerance(p.get("tolerance"), path + ".tolerance");
            if (cv.tolerance() != null && !cv.tolerance().equals(t)) {
                throw fail(path + ".tolerance", "differs from the tolerance letter in the value");
            }
            return t;
        }
        if (cv.tolerance() != null) {
            return cv.tolerance();
        }
        if (role == Role.OTHER || role == Role.CONTROL_BYPASS) {
            return Tolerance.NONE;
        }
        throw fail(path + ".tolerance", "missing (e.g. tolerance = \"5%\" or \"J\")");
    }

    private Distribution distribution(JsonNode p, String path) {
        if (!p.has("distribution")) {
            return Distribution.RECTANGULAR;
        }
        String d = string(p, path + ".distribution", true);
        Distribution dist = Distribution.fromFileName(d);
        if (dist == null) {
            throw fail(path + ".distribution", "unknown distribution \"" + d + "\" (rectangular, triangular or normal)");
        }
        return dist;
    }

    /** A potentiometer's travel: {@code "270 deg"} or {@code "25 turns"}. */
    private PotTravel travel(JsonNode n, String path) {
        if (n.isNumber()) {
            throw fail(path, "give the unit: \"" + n.asText() + " deg\" (a single-turn pot) or \"" + n.asText()
                    + " turns\" (a multi-turn trimmer)");
        }
        if (!n.isTextual()) {
            throw fail(path, "write the travel as text, e.g. \"270 deg\" or \"25 turns\"");
        }
        PotTravel t = PotTravel.parse(n.asText());
        if (t == null) {
            throw fail(path, "\"" + n.asText() + "\" is not a travel above zero: write e.g. \"270 deg\" (a"
                    + " single-turn pot) or \"25 turns\" (a multi-turn trimmer)");
        }
        return t;
    }

    private double wiper(JsonNode n, String path) {
        double w;
        if (n.isNumber()) {
            w = n.asDouble();
        } else if (n.isTextual() && n.asText().strip().endsWith("%")) {
            String t = n.asText().strip();
            try {
                w = Double.parseDouble(t.substring(0, t.length() - 1).strip()) / 100;
            } catch (NumberFormatException e) {
                throw fail(path, "\"" + t + "\" is not a wiper position (0 to 1, or 0% to 100%)");
            }
        } else {
            throw fail(path, "write the wiper position as a number from 0 to 1, or a percentage");
        }
        if (!(w >= 0 && w <= 1)) {
            throw fail(path, "wiper position " + n.asText() + " is outside 0 to 1");
        }
        return w;
    }

    private ControlPin control(JsonNode c, List<Element> elements) {
        boolean loads = false;
        for (Element e : elements) {
            loads |= e.role() == Role.CONTROL_LOAD;
        }
        if (c == null) {
            return loads ? ControlPin.loaded() : ControlPin.open();
        }
        onlyKeys(c, "control", CONTROL);
        String pin = string(c, "control.pin", true);
        ControlPin.Mode mode = ControlPin.Mode.fromFileName(pin);
        if (mode == null) {
            throw fail("control.pin", "unknown control pin wiring \"" + pin + "\" (open, bypassed, loaded or driven)");
        }
        if (loads && mode != ControlPin.Mode.LOADED && mode != ControlPin.Mode.DRIVEN) {
            throw fail("control.pin", "is \"" + pin + "\" but a part has role control-load: say pin = \"loaded\"");
        }
        if (mode == ControlPin.Mode.LOADED && !loads) {
            throw fail("control.pin", "is \"loaded\" but no part has role control-load");
        }
        if (mode != ControlPin.Mode.DRIVEN && (c.has("drive") || c.has("drive_ohms"))) {
            throw fail("control.drive", "only a driven control pin takes drive and drive_ohms");
        }
        switch (mode) {
            case DRIVEN: {
                double v = value(need(c, "control.drive"), "control.drive", Unit.VOLT).value();
                if (!(v >= 0)) {
                    throw fail("control.drive", "must be zero or more");
                }
                double r = c.has("drive_ohms") ? value(c.get("drive_ohms"), "control.drive_ohms", Unit.OHM).value() : 0;
                if (!(r >= 0)) {
                    throw fail("control.drive_ohms", "must be zero or more");
                }
                return ControlPin.driven(v, r);
            }
            case BYPASSED:
                return ControlPin.bypassed();
            case LOADED:
                return ControlPin.loaded();
            default:
                return ControlPin.open();
        }
    }

    private Trigger trigger(JsonNode t, Topology topology) {
        if (t == null) {
            return Trigger.UNSPECIFIED;
        }
        if (topology != Topology.MONOSTABLE) {
            throw fail("trigger", "only a monostable has a [trigger] table");
        }
        onlyKeys(t, "trigger", TRIGGER);
        double w = t.has("width") ? positive(t.get("width"), "trigger.width", Unit.SECOND) : Double.NaN;
        double i = t.has("interval") ? positive(t.get("interval"), "trigger.interval", Unit.SECOND) : Double.NaN;
        return new Trigger(w, i);
    }

    private void requireRoles(Topology topology, List<Element> elements) {
        for (Role r : topology.requiredRoles()) {
            int n = 0;
            for (Element e : elements) {
                n += e.role() == r ? 1 : 0;
            }
            if (n == 0) {
                throw fail("parts", article(topology.fileName()) + " needs a part with role \"" + r.fileName() + "\"");
            }
            boolean single = r == Role.CHARGE_DIODE || r == Role.DISCHARGE_DIODE || r == Role.SPLIT_POT;
            if (single && n > 1) {
                throw fail("parts", article(topology.fileName()) + " takes one part with role \"" + r.fileName() + "\", not " + n);
            }
        }
    }

    private static String article(String noun) {
        return ("aeiou".indexOf(noun.charAt(0)) >= 0 ? "an " : "a ") + noun;
    }

    // ---- small readers ----

    private JsonNode table(JsonNode root, String key, boolean required) {
        JsonNode n = root.get(key);
        if (n == null) {
            if (required) {
                throw fail(key, "missing [" + key + "] table");
            }
            return null;
        }
        if (!n.isObject()) {
            throw fail(key, "must be a table: [" + key + "]");
        }
        return n;
    }

    private JsonNode need(JsonNode table, String path) {
        JsonNode n = table.get(path.substring(path.lastIndexOf('.') + 1));
        if (n == null) {
            throw fail(path, "missing");
        }
        return n;
    }

    private String string(JsonNode table, String path, boolean required) {
        String key = path.substring(path.lastIndexOf('.') + 1);
        JsonNode n = table.get(key);
        if (n == null) {
            if (required) {
                throw fail(path, "missing");
            }
            return "";
        }
        if (!n.isTextual()) {
            throw fail(path, "must be text in quotes");
        }
        return n.asText();
    }

    private CodedValue value(JsonNode n, String path, Unit unit) {
        if (n.isNumber()) {
            return new CodedValue(n.asDouble(), null);
        }
        if (!n.isTextual()) {
            throw fail(path, "write a " + unit.quantityName() + " as text, e.g. \"4k7\" or \"10 nF\"");
        }
        try {
            return ValueCode.parse(n.asText(), unit);
        } catch (BadInputException e) {
            throw fail(path, e.what());
        }
    }

    private double positive(JsonNode n, String path, Unit unit) {
        double v = value(n, path, unit).value();
        if (!(v > 0)) {
            throw fail(path, "\"" + n.asText() + "\" is " + (v < 0 ? "negative" : "zero") + ": a "
                    + unit.quantityName() + " must be above zero");
        }
        return v;
    }

    private Tolerance tolerance(JsonNode n, String path) {
        if (!n.isTextual()) {
            throw fail(path, "write a tolerance as text, e.g. \"5%\", \"+22/-82%\" or \"J\"");
        }
        try {
            return Tolerance.parse(n.asText());
        } catch (BadInputException e) {
            throw fail(path, e.what());
        }
    }

    private Tempco tempco(JsonNode n, String path) {
        if (!n.isTextual()) {
            throw fail(path, "write a temperature coefficient as text, e.g. \"±50 ppm/K\"");
        }
        try {
            return Tempco.parse(n.asText());
        } catch (BadInputException e) {
            throw fail(path, e.what());
        }
    }

    private void onlyKeys(JsonNode table, String path, Set<String> allowed) {
        for (Iterator<String> it = table.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!allowed.contains(k)) {
                String p = path.isEmpty() ? k : path + "." + k;
                throw fail(p, "unknown key \"" + k + "\"" + (path.isEmpty() ? "" : " in [" + path + "]")
                        + " (allowed: " + String.join(", ", new java.util.TreeSet<>(allowed)) + ")");
            }
        }
    }

    private BadInputException fail(String path, String what) {
        int line = lines.line(path);
        for (String p = path; line == 0 && p.contains("."); ) {
            p = p.substring(0, p.lastIndexOf('.'));
            line = lines.line(p);
        }
        return new BadInputException(source + (line > 0 ? ":" + line : ""), path + ": " + what);
    }
}
