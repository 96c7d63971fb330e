package org.rcbench.protocol;

/** Why a gap was put into the edge stream. */
public enum Trouble {
    /** A delimited frame whose CRC did not match. */
    CRC_ERROR,
    /** Bytes that were not a frame (invalid COBS, too short, too long) were thrown away. */
    GARBAGE,
    /** The sequence number skipped: whole frames were lost. */
    SEQUENCE_GAP,
    /** The probe's dropped-edge total rose: it could not timestamp every edge. */
    OVERRUN,
    /** A frame with a good CRC whose contents break the format. */
    MALFORMED,
    /** A text-mode line that is not one of the defined lines. */
    BAD_LINE,
    /** The probe reset (a hello sent at boot) or its clock went backwards. */
    PROBE_RESTART,
    /** The transport went away (unplug, closed pipe) or the host stopped reading. */
    DISCONNECT
}
