package org.rcbench.protocol;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

class Crc16Test {
    // Greg Cook, "Catalogue of parametrised CRC algorithms", CRC-16/IBM-3740: check=0x29b1.
    // Cross-checked with Python's binascii.crc_hqx(b"123456789", 0xFFFF) == 0x29B1.
    @Test
    void checkValueMatchesTheCatalogue() {
        byte[] data = "123456789".getBytes(StandardCharsets.US_ASCII);
        assertThat(Crc16.of(data, 0, data.length)).isEqualTo(0x29B1).isEqualTo(Crc16.CHECK);
    }

    @Test
    void emptyInputLeavesTheInitialValue() {
        assertThat(Crc16.of(new byte[0], 0, 0)).isEqualTo(0xFFFF);
    }

    @Test
    void updatingInPiecesEqualsOnePass() {
        byte[] data = "123456789".getBytes(StandardCharsets.US_ASCII);
        int crc = Crc16.update(Crc16.INIT, data, 0, 4);
        assertThat(Crc16.update(crc, data, 4, 5)).isEqualTo(0x29B1);
    }

    // The catalogue's residue for CRC-16/IBM-3740 is 0x0000: the CRC of data followed by its CRC
    // sent most significant byte first is zero (the wire sends it low byte first; this checks the
    // register arithmetic independently of byte order).
    @Test
    void residueIsZero() {
        byte[] data = {'1', '2', '3', '4', '5', '6', '7', '8', '9', 0x29, (byte) 0xB1};
        assertThat(Crc16.of(data, 0, data.length)).isZero();
    }
}
