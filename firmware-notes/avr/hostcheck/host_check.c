/*
 * Host build of frames.c for rcbench's test suite: reads a scenario on stdin and writes the
 * frames the probe would send on stdout, so the Java decoder can check the firmware's encoder.
 *   E tick channel level drops_before   an edge
 *   F                                   flush the pending edge frame
 *   B now late_drops                    heartbeat
 */
#include <stdio.h>
#include <stdlib.h>

#include "../frames.h"

void rcb_put(uint8_t b) {
    putchar(b);
}

void rcb_sent(void) {
}

int main(void) {
    char kind;
    while (scanf(" %c", &kind) == 1) {
        unsigned long long a, d;
        unsigned ch, level;
        if (kind == 'E' && scanf("%llu %u %u %llu", &a, &ch, &level, &d) == 4) {
            rcb_edges_add(a, (uint8_t) ch, (uint8_t) level, (uint8_t) d);
        } else if (kind == 'F') {
            rcb_edges_flush();
        } else if (kind == 'B' && scanf("%llu %llu", &a, &d) == 2) {
            rcb_edges_heartbeat(a, (uint8_t) d);
        } else {
            fprintf(stderr, "bad scenario line starting with %c\n", kind);
            return 2;
        }
    }
    rcb_edges_flush();
    return fflush(stdout) == 0 ? 0 : 1;
}
