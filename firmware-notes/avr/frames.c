/* Frame writing for the rcbench probe protocol; see frames.h. */
#include "frames.h"

#include "rcbench_protocol.h"

#ifdef __AVR__
#include <util/crc16.h>
uint16_t rcb_crc_update(uint16_t crc, uint8_t b) {
    return _crc_xmodem_update(crc, b); /* the same register step, in avr-libc's assembly */
}
#else
uint16_t rcb_crc_update(uint16_t crc, uint8_t b) {
    crc ^= (uint16_t) b << 8;
    for (uint8_t i = 0; i < 8; i++) {
        crc = (crc & 0x8000) ? (uint16_t) ((crc << 1) ^ 0x1021) : (uint16_t) (crc << 1);
    }
    return crc;
}
#endif

uint8_t rcb_tx_seq;

void rcb_send_frame(uint8_t *frame, uint8_t type, uint8_t payload_len) {
    uint8_t n = RCB_HEADER + payload_len;
    frame[0] = type;
    frame[1] = rcb_tx_seq++;
    uint16_t crc = 0xFFFF;
    for (uint8_t i = 0; i < n; i++) {
        crc = rcb_crc_update(crc, frame[i]);
    }
    frame[n++] = (uint8_t) crc; /* low byte first */
    frame[n++] = (uint8_t) (crc >> 8);
    /* COBS one group at a time: the distance to the next zero (or the end), then the data. */
    uint8_t start = 0;
    for (;;) {
        uint8_t end = start;
        while (end < n && frame[end] != 0 && end - start < 254) {
            end++;
        }
        rcb_put((uint8_t) (end - start + 1));
        for (uint8_t i = start; i < end; i++) {
            rcb_put(frame[i]);
        }
        if (end == n) {
            break;
        }
        /* A group of 254 data bytes implies no zero; any other group ends at a zero, skipped. */
        start = end - start == 254 ? end : end + 1;
    }
    rcb_put(RCB_DELIMITER);
    rcb_sent();
}

int16_t rcb_cobs_decode(uint8_t *b, uint8_t len) {
    uint8_t in = 0, out = 0;
    while (in < len) {
        uint8_t code = b[in++];
        if (code == 0 || in + code - 1 > len) {
            return -1;
        }
        for (uint8_t k = 1; k < code; k++) {
            b[out++] = b[in++];
        }
        if (code != 0xFF && in < len) {
            b[out++] = 0;
        }
    }
    return out;
}

static uint8_t edge_frame[RCB_MAX_FRAME];
static uint8_t items_end = RCB_HEADER + RCB_EDGES_FIXED;
static uint8_t edges_pending;
static uint64_t frame_first;  /* tick of the frame's first edge: its base */
static uint64_t last_edge;
static uint32_t dropped_total; /* edges lost since reset, as reported */

static void send_edges(uint64_t base) {
    uint8_t p = RCB_HEADER;
    for (uint8_t i = 0; i < 6; i++) {
        edge_frame[p++] = (uint8_t) (base >> (8 * i));
    }
    for (uint8_t i = 0; i < 4; i++) {
        edge_frame[p++] = (uint8_t) (dropped_total >> (8 * i));
    }
    rcb_send_frame(edge_frame, RCB_T_EDGES, items_end - RCB_HEADER);
    edges_pending = 0;
    items_end = RCB_HEADER + RCB_EDGES_FIXED;
}

void rcb_edges_reset(void) {
    edges_pending = 0;
    items_end = RCB_HEADER + RCB_EDGES_FIXED;
}

void rcb_edges_flush(void) {
    if (edges_pending) {
        send_edges(frame_first);
    }
}

void rcb_edges_add(uint64_t tick, uint8_t channel, uint8_t level, uint8_t drops_before) {
    if (drops_before) {
        /* The protocol: end the frame, so the rise of dropped_total shows before this edge. */
        rcb_edges_flush();
        dropped_total += drops_before;
    }
    uint64_t delta = edges_pending ? tick - last_edge : 0;
    if (edges_pending && (delta >> 47) != 0) {
        rcb_edges_flush(); /* a step too large for one item: start a new frame at this edge */
    }
    if (items_end + RCB_MAX_ITEM_BYTES > RCB_HEADER + RCB_MAX_PAYLOAD) {
        rcb_edges_flush();
    }
    if (!edges_pending) {
        frame_first = tick;
        last_edge = tick;
        delta = 0;
    }
    uint64_t v = (delta << 4) | (uint64_t) ((channel & 7) << 1) | (level & 1);
    while (v >= 0x80) {
        edge_frame[items_end++] = (uint8_t) v | 0x80;
        v >>= 7;
    }
    edge_frame[items_end++] = (uint8_t) v;
    last_edge = tick;
    edges_pending++;
}

void rcb_edges_heartbeat(uint64_t now, uint8_t late_drops) {
    rcb_edges_flush();
    dropped_total += late_drops;
    send_edges(now);
}

uint8_t rcb_edges_pending(void) {
    return edges_pending;
}

uint64_t rcb_edges_first(void) {
    return frame_first;
}
