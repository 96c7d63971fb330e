package org.rcbench.capture;

import java.util.Arrays;

/**
 * Identifier codes of a value change dump mapped to an int, looked up from bytes in place so the
 * value-change loop allocates nothing. One-character codes (the usual case) index an array;
 * longer ones go to an open-addressing hash table. Not thread-safe.
 */
final class VcdIds {
    static final int NOT_FOUND = Integer.MIN_VALUE;

    private final int[] single = new int[256];
    private byte[] pool = new byte[256];
    private int poolUsed;
    /** Per slot: offset in pool, length, value; offset -1 = empty. */
    private int[] offsets = new int[64];
    private int[] lengths = new int[64];
    private int[] values = new int[64];
    private int used;

    VcdIds() {
        Arrays.fill(single, NOT_FOUND);
        Arrays.fill(offsets, -1);
    }

    /** The value stored for {@code b[from..to)}, or {@link #NOT_FOUND}. */
    int get(byte[] b, int from, int to) {
        int n = to - from;
        if (n == 1) {
            return single[b[from] & 0xff];
        }
        int mask = offsets.length - 1;
        for (int s = hash(b, from, to) & mask;; s = (s + 1) & mask) {
            int off = offsets[s];
            if (off < 0) {
                return NOT_FOUND;
            }
            if (lengths[s] == n && Arrays.equals(pool, off, off + n, b, from, to)) {
                return values[s];
            }
        }
    }

    /** Stores {@code value} unless the code is present; returns the value now stored. */
    int putIfAbsent(byte[] key, int value) {
        int old = get(key, 0, key.length);
        if (old != NOT_FOUND) {
            return old;
        }
        if (key.length == 1) {
            single[key[0] & 0xff] = value;
            return value;
        }
        if (2 * (used + 1) > offsets.length) {
            grow();
        }
        if (poolUsed + key.length > pool.length) {
            pool = Arrays.copyOf(pool, Math.max(pool.length * 2, poolUsed + key.length));
        }
        System.arraycopy(key, 0, pool, poolUsed, key.length);
        insert(poolUsed, key.length, value);
        poolUsed += key.length;
        used++;
        return value;
    }

    private void insert(int off, int len, int value) {
        int mask = offsets.length - 1;
        int s = hash(pool, off, off + len) & mask;
        while (offsets[s] >= 0) {
            s = (s + 1) & mask;
        }
        offsets[s] = off;
        lengths[s] = len;
        values[s] = value;
    }

    private void grow() {
        int[] oldOffsets = offsets;
        int[] oldLengths = lengths;
        int[] oldValues = values;
        offsets = new int[oldOffsets.length * 2];
        lengths = new int[offsets.length];
        values = new int[offsets.length];
        Arrays.fill(offsets, -1);
        for (int i = 0; i < oldOffsets.length; i++) {
            if (oldOffsets[i] >= 0) {
                insert(oldOffsets[i], oldLengths[i], oldValues[i]);
            }
        }
    }

    /** FNV-1a, then a final mix so the low bits used as slot index depend on every byte. */
    private static int hash(byte[] b, int from, int to) {
        int h = 0x811c9dc5;
        for (int i = from; i < to; i++) {
            h = (h ^ (b[i] & 0xff)) * 0x01000193;
        }
        return h ^ (h >>> 16);
    }
}
