package org.rcbench.protocol;

/**
 * The probe's side of the host commands, for simulated probes and test emulators: feed it the
 * bytes the host writes, and it calls the listener for each command frame with a good CRC, and
 * for each {@code ?} line (the text-mode hello request). Not thread-safe.
 */
public final class CommandReader {

    /** Receives what the host asked for. */
    public interface Listener {
        /** A well-formed command; answer with an {@link Ack} carrying {@code seq}. */
        void onCommand(HostCommand command, int seq);

        /** A frame with a good CRC that is not a well-formed host command (answer with a negative ack). */
        default void onBadCommand(int type, int seq) {
        }

        /** The line {@code ?} (a text-mode hello request). */
        default void onTextHelloRequest() {
        }
    }

    private final FrameReader frames;
    private final Listener listener;
    private int lineLength;
    private boolean lineIsQuery;

    public CommandReader(Listener listener) {
        this.listener = listener;
        this.frames = new FrameReader(new FrameReader.Handler() {
            @Override
            public void onFrame(int type, int seq, byte[] buf, int off, int len) {
                HostCommand c = HostCommand.parse(type, buf, off, len);
                if (c == null) {
                    listener.onBadCommand(type, seq);
                } else {
                    listener.onCommand(c, seq);
                }
            }

            @Override
            public void onDiscard(Trouble why, int bytes) {
                // A probe ignores what it cannot read; the host retries.
            }
        });
    }

    public void feed(byte[] b, int off, int len) {
        for (int i = off, end = off + len; i < end; i++) {
            byte x = b[i];
            frames.accept(x);
            if (x == '\n') {
                if (lineIsQuery && lineLength == 1) {
                    listener.onTextHelloRequest();
                }
                lineLength = 0;
                lineIsQuery = false;
            } else if (x != '\r') {
                lineIsQuery = lineLength == 0 && x == '?';
                lineLength++;
            }
        }
    }
}
