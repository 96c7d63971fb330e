package org.rcbench.json;

import com.fasterxml.jackson.core.JacksonException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.rcbench.common.BadInputException;
import org.rcbench.probe.CalibrationStore;
import org.rcbench.probe.StoredCalibration;

/**
 * Probe calibrations in one small JSON file, by default {@code calibrations.json} in the user's
 * data folder ({@link #defaultPath()}). Every calibration is kept; the newest of a probe is the one
 * applied.
 *
 * <pre>
 * {"rcbench_calibrations": 1,
 *  "calibrations": [{"probe_id": "72636273696d0001", "offset_ppm": 37.02, "u_ppm": 0.41,
 *                    "reference": "1 Hz reference, +-0.1 ppm", "measured_at": "2025-03-14T09:26:53.000Z"}]}
 * </pre>
 *
 * <p>Saving writes a new file next to the old one and moves it into place, so a crash leaves either
 * the old or the new file, never half of one. A file that cannot be read is a one-line
 * {@link BadInputException} naming it. Thread-safe within one process (methods are synchronized);
 * two processes saving at the same moment may lose one of the two saves.
 */
public final class CalibrationFile implements CalibrationStore {
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    private static final String FORMAT = "rcbench_calibrations";

    private final Path file;

    private CalibrationFile(Path file) {
        this.file = file;
    }

    /** The store in {@code file} (created on the first save). */
    public static CalibrationFile at(Path file) {
        return new CalibrationFile(file);
    }

    /** The store at {@link #defaultPath()}. */
    public static CalibrationFile atDefault() {
        return at(defaultPath());
    }

    /**
     * {@code calibrations.json} in the user's data folder: {@code $XDG_DATA_HOME/rcbench} (or
     * {@code ~/.local/share/rcbench}) on Linux and other Unix systems (XDG Base Directory
     * Specification), {@code ~/Library/Application Support/rcbench} on macOS, and
     * {@code %LOCALAPPDATA%\rcbench} on Windows.
     */
    public static Path defaultPath() {
        return defaultPath(System.getProperty("os.name", ""), System.getenv(), Path.of(System.getProperty("user.home")));
    }

    static Path defaultPath(String osName, Map<String, String> env, Path home) {
        String os = osName.toLowerCase(Locale.ROOT);
        Path base;
        if (os.startsWith("windows")) {
            String local = env.get("LOCALAPPDATA");
            base = local != null && Path.of(local).isAbsolute() ? Path.of(local) : home.resolve("AppData/Local");
        } else if (os.startsWith("mac")) {
            base = home.resolve("Library/Application Support");
        } else {
            String xdg = env.get("XDG_DATA_HOME");
            base = xdg != null && !xdg.isBlank() && Path.of(xdg).isAbsolute() ? Path.of(xdg)
                    : home.resolve(".local/share");
        }
        return base.resolve("rcbench").resolve("calibrations.json");
    }

    /** The file this store reads and writes. */
    public Path file() {
        return file;
    }

    @Override
    public synchronized void save(StoredCalibration c) {
        List<StoredCalibration> all = new ArrayList<>(readAll());
        all.add(c);
        ObjectNode root = MAPPER.createObjectNode();
        root.put(FORMAT, 1);
        ArrayNode list = root.putArray("calibrations");
        for (StoredCalibration s : all) {
            ObjectNode o = list.addObject();
            o.put("probe_id", s.probeId());
            o.put("offset_ppm", s.offsetPpm());
            o.put("u_ppm", s.uncertaintyPpm());
            o.put("reference", s.reference());
            o.put("measured_at", s.measuredAt().toString());
        }
        try {
            Path dir = file.toAbsolutePath().getParent();
            Files.createDirectories(dir);
            Path tmp = Files.createTempFile(dir, ".calibrations", ".tmp");
            Files.writeString(tmp, MAPPER.writeValueAsString(root) + "\n");
            try {
                Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (IOException e) {
            throw new BadInputException(file.toString(), "cannot save the calibration: " + e.getMessage(), e);
        }
    }

    @Override
    public synchronized Optional<StoredCalibration> latest(String probeIdHex) {
        StoredCalibration best = null;
        for (StoredCalibration c : readAll()) {
            if (c.probeId().equalsIgnoreCase(probeIdHex) && (best == null || !c.measuredAt().isBefore(best.measuredAt()))) {
                best = c;
            }
        }
        return Optional.ofNullable(best);
    }

    /** Every calibration in the file, oldest first as saved; empty when there is no file. */
    public synchronized List<StoredCalibration> readAll() {
        String text;
        try {
            text = Files.readString(file);
        } catch (NoSuchFileException e) {
            return List.of();
        } catch (IOException e) {
            throw new BadInputException(file.toString(), "cannot read the calibrations: " + e.getMessage(), e);
        }
        JsonNode root;
        try {
            root = MAPPER.readTree(text);
        } catch (JacksonException e) {
            throw new BadInputException(file.toString(), "not a calibration file (not valid JSON)", e);
        }
        if (root == null || !root.isObject() || root.path(FORMAT).asInt() != 1 || !root.path("calibrations").isArray()) {
            throw new BadInputException(file.toString(), "not an rcbench calibration file (version 1)");
        }
        List<StoredCalibration> out = new ArrayList<>();
        int i = 0;
        for (JsonNode n : root.get("calibrations")) {
            try {
                out.add(new StoredCalibration(n.path("probe_id").asText(), number(n, "offset_ppm"), number(n, "u_ppm"),
                        n.path("reference").asText(""), Instant.parse(n.path("measured_at").asText())));
            } catch (IllegalArgumentException | DateTimeParseException e) {
                throw new BadInputException(file.toString(), "calibration " + (i + 1) + " is damaged: " + e.getMessage(), e);
            }
            i++;
        }
        return out;
    }

    private static double number(JsonNode n, String key) {
        JsonNode v = n.get(key);
        if (v == null || !v.isNumber()) {
            throw new IllegalArgumentException(key + " is not a number");
        }
        return v.asDouble();
    }
}
