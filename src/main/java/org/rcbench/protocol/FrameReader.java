package org.rcbench.protocol;

/**
 * Splits a byte stream at zero delimiters, undoes COBS, checks length and CRC, and hands each good
 * frame to a {@link Handler}. Anything else between two delimiters (a bad CRC, invalid COBS, a
 * block too short or longer than {@link Wire#MAX_ENCODED}) is thrown away as one stretch and
 * reported, so framing is regained at the very next delimiter. Empty blocks (two delimiters in a
 * row) are idle fill and are not reported.
 *
 * <p>Used in both directions: host side inside {@link StreamDecoder}, probe side in
 * {@link CommandReader}. Not thread-safe; allocation-free after construction.
 */
public final class FrameReader {

    /** Receives frames and thrown-away stretches. */
    public interface Handler {
        /**
         * A frame with a good CRC. The payload is {@code buf[off, off + len)}, valid during the
         * call only.
         */
        void onFrame(int type, int seq, byte[] buf, int off, int len);

        /**
         * A stretch of {@code bytes} bytes (not counting its delimiter) was thrown away, because of
         * a CRC mismatch ({@link Trouble#CRC_ERROR}) or because it was not a frame at all
         * ({@link Trouble#GARBAGE}).
         */
        void onDiscard(Trouble why, int bytes);
    }

    private final Handler handler;
    private final byte[] block = new byte[Wire.MAX_ENCODED];
    private int fill;
    /** Bytes of the current over-long stretch beyond what {@link #block} holds. */
    private long overflow;

    long framesOk;
    long crcErrors;
    long resyncs;
    long bytesDiscarded;
    long framedBytes;

    public FrameReader(Handler handler) {
        this.handler = handler;
    }

    /** Feeds one byte. */
    public void accept(byte b) {
        if (b != 0) {
            if (fill < block.length) {
                block[fill++] = b;
            } else {
                overflow++;
            }
            return;
        }
        if (overflow > 0) {
            discard(Trouble.GARBAGE, fill + overflow);
        } else if (fill > 0) {
            finishBlock();
        }
        fill = 0;
        overflow = 0;
    }

    /** Feeds {@code len} bytes from {@code off}. */
    public void accept(byte[] b, int off, int len) {
        for (int i = off, end = off + len; i < end; i++) {
            accept(b[i]);
        }
    }

    /** Bytes held since the last delimiter (a frame still arriving). */
    public long pendingBytes() {
        return fill + overflow;
    }

    /** Drops any partial frame (after a disconnect) and reports it as thrown away. */
    public void flushPartial() {
        if (fill + overflow > 0) {
            discard(Trouble.GARBAGE, fill + overflow);
        }
        fill = 0;
        overflow = 0;
    }

    private void finishBlock() {
        int encoded = fill;
        int n = Cobs.decode(block, 0, encoded, block, 0);
        if (n < Wire.HEADER + Wire.TRAILER) {
            discard(Trouble.GARBAGE, encoded);
            return;
        }
        int payloadLen = n - Wire.HEADER - Wire.TRAILER;
        int crc = Bytes.u16(block, n - Wire.TRAILER);
        if (Crc16.of(block, 0, n - Wire.TRAILER) != crc) {
            crcErrors++;
            discard(Trouble.CRC_ERROR, encoded);
            return;
        }
        framesOk++;
        framedBytes += encoded + 1;
        handler.onFrame(block[0] & 0xFF, block[1] & 0xFF, block, Wire.HEADER, payloadLen);
    }

    private void discard(Trouble why, long bytes) {
        resyncs++;
        bytesDiscarded += bytes;
        handler.onDiscard(why, (int) Math.min(bytes, Integer.MAX_VALUE));
    }
}
