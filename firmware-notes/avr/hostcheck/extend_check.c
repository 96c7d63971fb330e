/*
 * Checks rcb_high_part() (frames.h) against a model of Timer1 and its interrupts: a capture at
 * true tick T, its interrupt starting d ticks later, the overflow interrupt of each wrap W running
 * s ticks after W. The capture interrupt outranks the overflow interrupt (vectors 10 and 13 on
 * the ATmega328P: the lower vector wins), so a wrap after T is still pending when the capture
 * interrupt runs; a wrap before T may or may not have been serviced. For every T near a wrap and
 * every d, s below 0x8000 the extended tick must equal T. Exit status 0 when it always does.
 */
#include <stdio.h>

#include "../frames.h"

int main(void) {
    const uint64_t base = 5ULL << 16; /* five wraps already counted */
    long checked = 0;
    for (int64_t offset = -0x9000; offset <= 0x9000; offset += 7) {
        uint64_t t = base + 0x10000 + offset; /* around the sixth wrap, at base + 0x10000 */
        for (uint64_t d = 0; d < 0x8000; d += 61) {
            for (uint64_t s = 0; s < 0x8000; s += 433) {
                uint64_t e = t + d; /* the capture interrupt starts */
                uint32_t serviced = 0;
                uint8_t pending = 0;
                for (uint64_t w = 0x10000; w <= e; w += 0x10000) {
                    if (w <= t && w + s <= e) {
                        serviced++;
                    } else {
                        pending = 1;
                    }
                }
                if (pending && serviced + 1 < (uint32_t) (e >> 16)) {
                    continue; /* two unserviced wraps: outside the model (the flag holds one) */
                }
                uint32_t hi = rcb_high_part(serviced, (uint16_t) t, pending);
                uint64_t got = ((uint64_t) hi << 16) | (uint16_t) t;
                if (got != t) {
                    printf("wrong: t=%llu d=%llu s=%llu got=%llu\n", (unsigned long long) t,
                            (unsigned long long) d, (unsigned long long) s, (unsigned long long) got);
                    return 1;
                }
                checked++;
            }
        }
    }
    printf("%ld cases\n", checked);
    return 0;
}
