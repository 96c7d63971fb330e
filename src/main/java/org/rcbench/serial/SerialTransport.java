package org.rcbench.serial;

import com.fazecast.jSerialComm.SerialPort;
import com.fazecast.jSerialComm.SerialPortDataListener;
import com.fazecast.jSerialComm.SerialPortEvent;
import com.fazecast.jSerialComm.SerialPortInvalidPortException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicBoolean;
import org.rcbench.common.BadInputException;
import org.rcbench.probe.ByteTransport;
import org.rcbench.probe.DtrPolicy;

/**
 * A serial port as a {@link ByteTransport}: 8N1 at the given baud rate, semi-blocking reads (they
 * return as soon as one byte is there, or after the timeout), blocking writes.
 *
 * <p>Unplugging: jSerialComm keeps {@code isOpen()} true and reports the disconnect event in a
 * tight loop until the port is closed, so a disconnect-only listener closes the port once, behind
 * an {@link AtomicBoolean}, inside the callback; reads then return -1. Thread-safe for one reader
 * and any number of writers.
 */
public final class SerialTransport implements ByteTransport {
    private final SerialPort port;
    private final String name;
    private final String usbId;
    private final AtomicBoolean closed = new AtomicBoolean();
    private int readTimeoutMillis;

    private SerialTransport(SerialPort port, String name, String usbId, int readTimeoutMillis) {
        this.port = port;
        this.name = name;
        this.usbId = usbId;
        this.readTimeoutMillis = readTimeoutMillis;
    }

    /**
     * Opens {@code path} (a device, a {@code /dev/serial/by-id} link or a pty symlink) at {@code baud}.
     * Throws {@link BadInputException} naming the port when it is missing, not permitted or busy.
     */
    public static SerialTransport open(String path, int baud, DtrPolicy dtr, int readTimeoutMillis) {
        Path device = Path.of(path);
        if (!path.regionMatches(true, 0, "COM", 0, 3) && !Files.exists(device)) {
            throw new BadInputException(path, "no such port: is the probe plugged in? ('rcbench ports' lists ports)");
        }
        SerialPort port;
        try {
            port = SerialPort.getCommPort(path);
        } catch (SerialPortInvalidPortException e) {
            throw new BadInputException(path, "not a serial port");
        }
        port.setComPortParameters(baud, 8, SerialPort.ONE_STOP_BIT, SerialPort.NO_PARITY);
        port.setComPortTimeouts(SerialPort.TIMEOUT_READ_SEMI_BLOCKING | SerialPort.TIMEOUT_WRITE_BLOCKING,
                readTimeoutMillis, 2000);
        if (dtr == DtrPolicy.HOLD_LOW) {
            port.clearDTR(); // applied as the port opens
        }
        if (!port.openPort()) {
            throw new BadInputException(path, whyNotOpen(device, port.getLastErrorCode()));
        }
        // After a good open on a pty the last error code reads 25 (a modem-control ioctl ptys lack): not a failure.
        if (dtr == DtrPolicy.RAISE) {
            port.setDTR();
        }
        String system = port.getSystemPortPath();
        String name = system == null || system.equals(path) ? path : path + " (" + system + ")";
        SerialTransport t = new SerialTransport(port, name, usbId(port), readTimeoutMillis);
        port.addDataListener(new SerialPortDataListener() {
            @Override
            public int getListeningEvents() {
                return SerialPort.LISTENING_EVENT_PORT_DISCONNECTED;
            }

            @Override
            public void serialEvent(SerialPortEvent event) {
                t.close();
            }
        });
        return t;
    }

    private static String whyNotOpen(Path device, int errorCode) {
        PortAccess.Verdict access = PortAccess.check(device);
        if (!access.ok()) {
            return access.advice();
        }
        String mm = PortAccess.modemManagerNote(device);
        return "cannot open (busy, or not a serial port; error " + errorCode + ")"
                + (mm.isEmpty() ? "" : ": " + mm);
    }

    /** {@code vvvv:pppp:serial} in hex, or "" when the port has no USB identity. */
    static String usbId(SerialPort p) {
        int vid = p.getVendorID();
        int pid = p.getProductID();
        if (vid < 0 || pid < 0) {
            return "";
        }
        String serial = p.getSerialNumber();
        return String.format(Locale.ROOT, "%04x:%04x", vid, pid)
                + (serial == null || serial.isBlank() || serial.equals("Unknown") ? "" : ":" + serial);
    }

    @Override
    public int read(byte[] buf, int off, int len, int timeoutMillis) throws IOException {
        if (closed.get()) {
            return -1;
        }
        if (timeoutMillis != readTimeoutMillis) {
            port.setComPortTimeouts(SerialPort.TIMEOUT_READ_SEMI_BLOCKING | SerialPort.TIMEOUT_WRITE_BLOCKING,
                    timeoutMillis, 2000);
            readTimeoutMillis = timeoutMillis;
        }
        int n = port.readBytes(buf, len, off);
        return n < 0 || closed.get() && n == 0 ? -1 : n;
    }

    @Override
    public void write(byte[] buf, int off, int len) throws IOException {
        if (closed.get()) {
            throw new IOException(name + ": port closed");
        }
        int done = 0;
        while (done < len) {
            int n = port.writeBytes(buf, len - done, off + done);
            if (n <= 0) {
                throw new IOException(name + ": write failed");
            }
            done += n;
        }
    }

    @Override
    public void setDtr(boolean high) {
        if (!closed.get()) {
            if (high) {
                port.setDTR();
            } else {
                port.clearDTR();
            }
        }
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public String usbId() {
        return usbId;
    }

    @Override
    public void close() {
        if (closed.compareAndSet(false, true)) {
            // Also called from the disconnect callback: closing there is what stops its event loop.
            port.closePort();
        }
    }
}
