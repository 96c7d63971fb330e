package org.rcbench.protocol;

/**
 * Consistent Overhead Byte Stuffing (S. Cheshire and M. Baker, "Consistent Overhead Byte
 * Stuffing", IEEE/ACM Transactions on Networking 7(2), 1999): removes every zero byte from a block
 * so that zero can delimit frames. Each code byte {@code n} (1..255) is followed by {@code n - 1}
 * data bytes and stands for a zero after them, except after a code of 255 and at the end of the
 * block. Blocks up to 254 bytes grow by exactly one byte. Static, allocation-free, thread-safe.
 */
public final class Cobs {
    private Cobs() {
    }

    /** Upper bound of the encoded length of {@code len} bytes. */
    public static int maxEncodedLength(int len) {
        return len + len / 254 + 1;
    }

    /**
     * Encodes {@code len} bytes of {@code src} from {@code off} into {@code dst} from
     * {@code dstOff} (no delimiter is written) and returns the number of bytes written.
     * {@code dst} needs {@link #maxEncodedLength(int)} bytes.
     */
    public static int encode(byte[] src, int off, int len, byte[] dst, int dstOff) {
        int codeAt = dstOff;
        int out = dstOff + 1;
        int code = 1;
        for (int i = off, end = off + len; i < end; i++) {
            byte b = src[i];
            if (b != 0) {
                dst[out++] = b;
                code++;
            }
            if (b == 0 || code == 0xFF) {
                dst[codeAt] = (byte) code;
                code = 1;
                codeAt = out;
                // A block that ends the input needs no further code byte.
                if (b == 0 || i + 1 < end) {
                    out++;
                }
            }
        }
        if (codeAt < out) {
            dst[codeAt] = (byte) code;
        }
        return out - dstOff;
    }

    /**
     * Decodes {@code len} encoded bytes (without delimiter) of {@code src} from {@code off} into
     * {@code dst} from {@code dstOff}; decoding in place ({@code src == dst}, same offset) works.
     * Returns the decoded length, or -1 when the block is not valid COBS (a zero byte, or a code
     * byte pointing past the end).
     */
    public static int decode(byte[] src, int off, int len, byte[] dst, int dstOff) {
        int in = off;
        int end = off + len;
        int out = dstOff;
        while (in < end) {
            int code = src[in++] & 0xFF;
            if (code == 0 || in + code - 1 > end) {
                return -1;
            }
            for (int k = 1; k < code; k++) {
                byte b = src[in++];
                if (b == 0) {
                    return -1;
                }
                dst[out++] = b;
            }
            if (code != 0xFF && in < end) {
                dst[out++] = 0;
            }
        }
        return out - dstOff;
    }
}
