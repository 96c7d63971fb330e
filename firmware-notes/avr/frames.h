/*
 * Frame writing for the rcbench probe protocol (firmware-notes/protocol.md): CRC, COBS, edge
 * frames. Plain C99 with no AVR registers, so the test suite also builds it for the host and
 * checks its output with rcbench's own decoder.
 */
#ifndef RCBENCH_FRAMES_H
#define RCBENCH_FRAMES_H

#include <stdint.h>

/*
 * Bits 16..47 of a 48-bit tick whose low 16 bits were captured by the 16-bit timer, given the
 * overflows counted so far and whether an overflow is pending (flag set, interrupt not yet run).
 * A pending overflow with a small captured value (< 0x8000) happened before the capture, so it
 * counts; with a large value it happened after. Correct while the pending overflow and the
 * capture are less than 0x8000 ticks apart (2 ms at 16 MHz); hostcheck/extend_check.c tests it.
 */
static inline uint32_t rcb_high_part(uint32_t overflows, uint16_t captured, uint8_t overflow_pending) {
    return overflows + (overflow_pending && captured < 0x8000 ? 1 : 0);
}

/* Provided by the program: send one byte (the UART on the probe, a buffer in the host check). */
void rcb_put(uint8_t b);
/* Provided by the program: called after each frame is sent (the probe notes the time). */
void rcb_sent(void);

/* One step of CRC-16/IBM-3740 (poly 0x1021, not reflected; start from 0xFFFF). */
uint16_t rcb_crc_update(uint16_t crc, uint8_t b);

/* Sends frame[2 .. 2+payload_len) as a frame of this type: writes type and seq into frame[0..1],
 * appends the CRC (frame needs 2 spare bytes), COBS-encodes and ends with the delimiter. */
void rcb_send_frame(uint8_t *frame, uint8_t type, uint8_t payload_len);

/* Undoes COBS in place; returns the decoded length, or -1 when the block is not valid. */
int16_t rcb_cobs_decode(uint8_t *b, uint8_t len);

/* The sequence number the next frame will carry. */
extern uint8_t rcb_tx_seq;

/* Edge frames (channel 0..7, level 0/1, drops_before = edges lost just before this one). */
void rcb_edges_reset(void);
void rcb_edges_add(uint64_t tick, uint8_t channel, uint8_t level, uint8_t drops_before);
void rcb_edges_flush(void);
/* An edge frame with no edges: nothing happened up to now; late_drops are edges lost since the last one. */
void rcb_edges_heartbeat(uint64_t now, uint8_t late_drops);
uint8_t rcb_edges_pending(void);
uint64_t rcb_edges_first(void);

#endif
