package org.rcbench.protocol;

/**
 * Numbers of the wire protocol, version 1, as specified in {@code firmware-notes/protocol.md}.
 *
 * <p>The reference firmware's header {@code firmware-notes/avr/rcbench_protocol.h} repeats these
 * values; a test parses that header and compares.
 */
public final class Wire {
    /** Protocol version carried in the hello frame. */
    public static final int PROTOCOL_VERSION = 1;

    /** Frame delimiter: every COBS-encoded frame ends with this byte, and no frame contains it. */
    public static final int DELIMITER = 0x00;
    /** Largest frame before COBS encoding: type + sequence + payload + CRC. */
    public static final int MAX_FRAME = 254;
    /** Bytes before the payload: type, sequence. */
    public static final int HEADER = 2;
    /** Bytes after the payload: CRC-16, low byte first. */
    public static final int TRAILER = 2;
    /** Largest payload of one frame. */
    public static final int MAX_PAYLOAD = MAX_FRAME - HEADER - TRAILER;
    /** Largest COBS-encoded frame, without its delimiter (one overhead byte for frames up to 254). */
    public static final int MAX_ENCODED = MAX_FRAME + 1;

    // Probe to host.
    public static final int T_HELLO = 0x01;
    public static final int T_EDGES = 0x02;
    public static final int T_ADC = 0x03;
    public static final int T_ACK = 0x04;
    public static final int T_NOTE = 0x05;

    // Host to probe.
    public static final int T_HELLO_REQUEST = 0x10;
    public static final int T_START = 0x11;
    public static final int T_STOP = 0x12;
    public static final int T_SET_EDGES = 0x13;
    public static final int T_SET_ADC = 0x14;

    // Hello flags.
    public static final int HELLO_AT_BOOT = 0x01;
    public static final int HELLO_CALIBRATED = 0x02;
    public static final int HELLO_HEARTBEAT = 0x04;
    public static final int HELLO_RUNNING = 0x08;

    // Edge capabilities in the hello frame.
    public static final int CAP_RISING = 0x01;
    public static final int CAP_FALLING = 0x02;
    public static final int CAP_BOTH = 0x04;
    public static final int CAP_NOISE_FILTER = 0x08;

    // Acknowledgement status.
    public static final int ACK_OK = 0;
    public static final int ACK_UNKNOWN_COMMAND = 1;
    public static final int ACK_BAD_ARGUMENT = 2;
    public static final int ACK_UNSUPPORTED = 3;

    /** Fixed part of the hello payload, before the probe name. */
    public static final int HELLO_FIXED = 39;
    /** Longest probe name in a hello frame, in bytes of ASCII. */
    public static final int MAX_NAME = 32;
    /** Fixed part of the edge payload: 48-bit base tick, 32-bit dropped-edge total. */
    public static final int EDGES_FIXED = 10;
    /** Fixed part of the ADC payload, before the samples. */
    public static final int ADC_FIXED = 18;
    /** Channels addressable in an edge item (3 bits). */
    public static final int MAX_EDGE_CHANNELS = 8;
    /** Longest edge item (a varint carrying at most 63 bits). */
    public static final int MAX_ITEM_BYTES = 9;
    /** Largest tick step one edge item may carry: 2^47 ticks. */
    public static final long MAX_DELTA = 1L << 47;
    /** Ticks in the edge and ADC frames are 48-bit and wrap at this value. */
    public static final long TICK_MODULUS = 1L << 48;

    private Wire() {
    }
}
