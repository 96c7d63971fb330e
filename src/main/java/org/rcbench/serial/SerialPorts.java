package org.rcbench.serial;

import com.fazecast.jSerialComm.SerialPort;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.rcbench.common.BadInputException;
import org.rcbench.probe.ByteTransport;
import org.rcbench.edge.EdgeSink;
import org.rcbench.probe.DtrPolicy;
import org.rcbench.probe.ProbeSession;
import org.rcbench.probe.SessionConfig;
import org.rcbench.probe.TransportOpener;
import org.rcbench.protocol.ProbeEvents;

/**
 * Lists serial ports and makes openers for {@link org.rcbench.probe.ProbeSession}: by device path,
 * or by USB id {@code vvvv:pppp[:serial]} (hex, as {@code rcbench ports} shows it), which finds the
 * probe again whatever device name it gets when plugged back in. Pseudo-terminals are not listed
 * (jSerialComm does not enumerate them) but open fine by path.
 */
public final class SerialPorts {
    /** The reference firmware's rate: exact at 16 MHz with U2X. */
    public static final int DEFAULT_BAUD = 500_000;
    private static final Path BY_ID = Path.of("/dev/serial/by-id");

    private SerialPorts() {
    }

    /** The ports jSerialComm finds, each with its stable links and an access check. */
    public static List<PortInfo> list() {
        List<PortInfo> out = new ArrayList<>();
        for (SerialPort p : SerialPort.getCommPorts()) {
            String path = p.getSystemPortPath();
            out.add(new PortInfo(path, p.getPortDescription(), SerialTransport.usbId(p), stableLinks(path),
                    PortAccess.check(Path.of(path))));
        }
        return out;
    }

    /** The {@code /dev/serial/by-id} links that resolve to {@code devicePath}. */
    static List<String> stableLinks(String devicePath) {
        List<String> links = new ArrayList<>();
        if (!Files.isDirectory(BY_ID)) {
            return links;
        }
        try (Stream<Path> s = Files.list(BY_ID)) {
            Path real = Path.of(devicePath).toRealPath();
            s.sorted().forEach(link -> {
                try {
                    if (link.toRealPath().equals(real)) {
                        links.add(link.toString());
                    }
                } catch (IOException e) {
                    // A dangling link: the device just went away.
                }
            });
        } catch (IOException e) {
            // No links to show.
        }
        return links;
    }

    /** True when {@code spec} is a USB id ({@code 2341:0043} or {@code 2341:0043:SERIAL}) rather than a path. */
    public static boolean isUsbId(String spec) {
        String[] f = spec.split(":", 3);
        return f.length >= 2 && f[0].matches("[0-9A-Fa-f]{4}") && f[1].matches("[0-9A-Fa-f]{4}");
    }

    /**
     * An opener for {@code spec} (device path or USB id) at {@code baud}. Opened by path, it
     * remembers the port's USB id at the first open and, when the path is gone or shows another
     * device after an unplug, finds the same USB id under its new name.
     */
    public static TransportOpener opener(String spec, int baud, DtrPolicy dtr, int readTimeoutMillis) {
        return new TransportOpener() {
            private String rememberedUsbId = isUsbId(spec) ? spec.toLowerCase(Locale.ROOT) : "";

            @Override
            public ByteTransport open() {
                if (isUsbId(spec)) {
                    return SerialTransport.open(findByUsbId(spec, rememberedUsbId), baud, dtr, readTimeoutMillis);
                }
                if (!rememberedUsbId.isEmpty() && !Files.exists(Path.of(spec))) {
                    return SerialTransport.open(findByUsbId(spec, rememberedUsbId), baud, dtr, readTimeoutMillis);
                }
                SerialTransport t = SerialTransport.open(spec, baud, dtr, readTimeoutMillis);
                if (rememberedUsbId.isEmpty()) {
                    rememberedUsbId = t.usbId();
                } else if (!t.usbId().isEmpty() && !t.usbId().equals(rememberedUsbId)) {
                    t.close();
                    return SerialTransport.open(findByUsbId(spec, rememberedUsbId), baud, dtr, readTimeoutMillis);
                }
                return t;
            }

            @Override
            public String name() {
                return spec;
            }
        };
    }

    /**
     * A session (not yet started) with the probe at {@code spec} (device path or USB id) at the
     * reference firmware's 500 000 baud, using the DTR policy and read timeout of {@code config}.
     */
    public static ProbeSession session(String spec, SessionConfig config, EdgeSink sink, ProbeEvents events) {
        return new ProbeSession(opener(spec, DEFAULT_BAUD, config.profile().dtr(), config.readTimeoutMillis()),
                config, sink, events);
    }

    /** The device path of the port whose USB id matches {@code id} (serial optional), else a one-line error. */
    static String findByUsbId(String spec, String id) {
        String wanted = id.toLowerCase(Locale.ROOT);
        for (SerialPort p : SerialPort.getCommPorts()) {
            String have = SerialTransport.usbId(p).toLowerCase(Locale.ROOT);
            if (!have.isEmpty() && (have.equals(wanted) || have.startsWith(wanted + ":"))) {
                return p.getSystemPortPath();
            }
        }
        throw new BadInputException(spec, "no port with USB id " + id + " is plugged in ('rcbench ports' lists them)");
    }
}
