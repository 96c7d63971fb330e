package org.rcbench.protocol;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class CobsTest {
    // Examples from the COBS description (Cheshire and Baker 1999) as tabulated in common references.
    @ParameterizedTest
    @CsvSource({
        "00, 01 01",
        "00 00, 01 01 01",
        "00 11 00, 01 02 11 01",
        "11 22 00 33, 03 11 22 02 33",
        "11 22 33 44, 05 11 22 33 44",
        "11 00 00 00, 02 11 01 01 01",
    })
    void encodesTheReferenceExamples(String raw, String encoded) {
        byte[] in = Hex.parse(raw);
        byte[] out = new byte[Cobs.maxEncodedLength(in.length)];
        int n = Cobs.encode(in, 0, in.length, out, 0);
        assertThat(Hex.format(Arrays.copyOf(out, n))).isEqualTo(encoded);
        byte[] back = new byte[in.length];
        assertThat(Cobs.decode(out, 0, n, back, 0)).isEqualTo(in.length);
        assertThat(back).isEqualTo(in);
    }

    @Test
    void twoHundredFiftyFourNonZeroBytesTakeOneCodeByte() {
        byte[] in = new byte[254];
        for (int i = 0; i < in.length; i++) {
            in[i] = (byte) (i + 1);
        }
        byte[] out = new byte[Cobs.maxEncodedLength(in.length)];
        int n = Cobs.encode(in, 0, in.length, out, 0);
        assertThat(n).isEqualTo(255);
        assertThat(out[0] & 0xFF).isEqualTo(0xFF);
        assertThat(Arrays.copyOfRange(out, 1, 255)).isEqualTo(in);
    }

    @Test
    void twoHundredFiftyFiveBytesEndingInFfNeedASecondGroup() {
        // 01 02 .. FE FF encodes to FF 01 .. FE 02 FF.
        byte[] in = new byte[255];
        for (int i = 0; i < in.length; i++) {
            in[i] = (byte) (i + 1);
        }
        byte[] out = new byte[Cobs.maxEncodedLength(in.length)];
        int n = Cobs.encode(in, 0, in.length, out, 0);
        assertThat(n).isEqualTo(257);
        assertThat(out[255] & 0xFF).isEqualTo(0x02);
        assertThat(out[256] & 0xFF).isEqualTo(0xFF);
    }

    @Test
    void randomBlocksRoundTripWithoutZeros() {
        Random random = new Random(5);
        for (int trial = 0; trial < 2000; trial++) {
            byte[] in = new byte[random.nextInt(600)];
            for (int i = 0; i < in.length; i++) {
                in[i] = random.nextInt(4) == 0 ? 0 : (byte) random.nextInt(256);
            }
            byte[] out = new byte[Cobs.maxEncodedLength(in.length)];
            int n = Cobs.encode(in, 0, in.length, out, 0);
            for (int i = 0; i < n; i++) {
                assertThat(out[i]).isNotZero();
            }
            byte[] back = new byte[in.length];
            assertThat(Cobs.decode(out, 0, n, back, 0)).isEqualTo(in.length);
            assertThat(back).isEqualTo(in);
        }
    }

    @Test
    void codePastTheEndIsRejected() {
        byte[] bad = Hex.parse("05 11 22");
        assertThat(Cobs.decode(bad, 0, bad.length, new byte[8], 0)).isEqualTo(-1);
    }
}
