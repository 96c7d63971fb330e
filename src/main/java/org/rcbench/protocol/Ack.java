package org.rcbench.protocol;

/**
 * A probe's answer to a host command.
 *
 * @param commandType the {@code Wire.T_*} type of the command answered
 * @param commandSeq  the sequence number of that command frame, 0..255
 * @param status      {@code Wire.ACK_*}: 0 done, 1 unknown command, 2 bad argument, 3 unsupported
 */
public record Ack(int commandType, int commandSeq, int status) {
    public boolean ok() {
        return status == Wire.ACK_OK;
    }

    /** The status in words, for messages. */
    public String statusText() {
        return switch (status) {
            case Wire.ACK_OK -> "done";
            case Wire.ACK_UNKNOWN_COMMAND -> "unknown command";
            case Wire.ACK_BAD_ARGUMENT -> "bad argument";
            case Wire.ACK_UNSUPPORTED -> "not supported by this probe";
            default -> "status " + status;
        };
    }
}
