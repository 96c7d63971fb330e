package org.rcbench.protocol;

/**
 * CRC-16/IBM-3740 (also known as CRC-16/CCITT-FALSE): width 16, polynomial 0x1021, initial value
 * 0xFFFF, input and output not reflected, final XOR 0x0000; check value over the ASCII bytes
 * {@code "123456789"} is 0x29B1 (Greg Cook, "Catalogue of parametrised CRC algorithms", entry
 * CRC-16/IBM-3740). Table driven, one lookup per byte, allocation-free; thread-safe.
 */
public final class Crc16 {
    /** Initial register value. */
    public static final int INIT = 0xFFFF;
    /** The catalogue's check value: the CRC of the nine ASCII bytes "123456789". */
    public static final int CHECK = 0x29B1;

    private static final char[] TABLE = new char[256];

    static {
        for (int i = 0; i < 256; i++) {
            int r = i << 8;
            for (int bit = 0; bit < 8; bit++) {
                r = (r & 0x8000) != 0 ? (r << 1) ^ 0x1021 : r << 1;
            }
            TABLE[i] = (char) r;
        }
    }

    private Crc16() {
    }

    /** The CRC of {@code len} bytes of {@code data} from {@code off}, as an int in 0..0xFFFF. */
    public static int of(byte[] data, int off, int len) {
        return update(INIT, data, off, len);
    }

    /** Continues a CRC computation: {@code crc} is the value so far (start with {@link #INIT}). */
    public static int update(int crc, byte[] data, int off, int len) {
        int r = crc & 0xFFFF;
        for (int i = off, end = off + len; i < end; i++) {
            r = ((r << 8) ^ TABLE[((r >>> 8) ^ data[i]) & 0xFF]) & 0xFFFF;
        }
        return r;
    }
}
