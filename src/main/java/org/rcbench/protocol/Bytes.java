package org.rcbench.protocol;

/** Little-endian field access for frame payloads. Static, allocation-free. */
final class Bytes {
    private Bytes() {
    }

    static int u8(byte[] b, int at) {
        return b[at] & 0xFF;
    }

    static int u16(byte[] b, int at) {
        return (b[at] & 0xFF) | (b[at + 1] & 0xFF) << 8;
    }

    static long u32(byte[] b, int at) {
        return (u16(b, at) | (long) u16(b, at + 2) << 16) & 0xFFFF_FFFFL;
    }

    static long u48(byte[] b, int at) {
        return u32(b, at) | (long) u16(b, at + 4) << 32;
    }

    static long u64(byte[] b, int at) {
        return u32(b, at) | u32(b, at + 4) << 32;
    }

    static int put8(byte[] b, int at, int v) {
        b[at] = (byte) v;
        return at + 1;
    }

    static int put16(byte[] b, int at, int v) {
        b[at] = (byte) v;
        b[at + 1] = (byte) (v >>> 8);
        return at + 2;
    }

    static int put32(byte[] b, int at, long v) {
        put16(b, at, (int) v);
        return put16(b, at + 2, (int) (v >>> 16));
    }

    static int put48(byte[] b, int at, long v) {
        put32(b, at, v);
        return put16(b, at + 4, (int) (v >>> 32));
    }

    static int put64(byte[] b, int at, long v) {
        put32(b, at, v);
        return put32(b, at + 4, v >>> 32);
    }
}
