/*
 * rcbench reference probe firmware for an ATmega328P at 16 MHz (avr-gcc, avr-libc).
 *
 * Input: ICP1 (PB0, "D8" on Uno/Nano-style boards), Timer1 input capture with the noise canceller,
 * both edges (ICES1 toggled after each capture). Timestamps: Timer1 at 16 MHz (prescaler 1)
 * extended to 48 bits by counting overflows. Output: the binary protocol of
 * firmware-notes/protocol.md on the UART at 500 000 baud (U2X, exact at 16 MHz), 8N1.
 *
 * EEPROM layout (little-endian; erased bytes 0xFF mean "not set"):
 *   0..7   probe id (u64)         8..11  calibration offset, ppb (i32)
 *   12..15 calibration uncertainty, ppb (u32)
 */
#include <avr/eeprom.h>
#include <avr/interrupt.h>
#include <avr/io.h>
#include <stdint.h>
#include <string.h>
#include <util/atomic.h>

#include "frames.h"
#include "rcbench_protocol.h"

#ifndef F_CPU
#error "F_CPU must be set (the Makefile sets 16000000UL)"
#endif
#ifndef BAUD
#define BAUD 500000UL
#endif
#ifndef CLOCK_SOURCE
#define CLOCK_SOURCE RCB_CLOCK_CRYSTAL
#endif

#define FW_MAJOR 1
#define FW_MINOR 0
#define FW_PATCH 0
#define PROBE_NAME "rcb-328p"
#define MAX_EDGE_RATE 100000UL

/* Flush a partly filled edge frame 20 ms after its first edge; heartbeat after 250 ms of silence. */
#define FLUSH_TICKS (F_CPU / 50)
#define HEARTBEAT_TICKS (F_CPU / 4)

/* ---- capture: interrupt side ------------------------------------------------------------- */

#define RING 64 /* entries; a power of two */
static volatile uint16_t ring_lo[RING];
static volatile uint32_t ring_hi[RING];
static volatile uint8_t ring_level[RING];
static volatile uint8_t ring_drops[RING]; /* edges lost just before this one, saturating at 255 */
static volatile uint8_t ring_head;         /* written by the ISR */
static volatile uint8_t ring_tail;         /* written by the main loop */
static volatile uint32_t overflows;        /* Timer1 overflows: bits 16..47 of the tick */
static volatile uint8_t pending_drops;     /* lost since the last stored edge */
static volatile uint8_t both_edges = 1;    /* toggle ICES1 after each capture */

ISR(TIMER1_OVF_vect) {
    overflows++;
}

/* Adds n lost edges to the count carried by the next stored edge. Interrupts are off. */
static inline void lose(uint8_t n) {
    uint16_t d = (uint16_t) pending_drops + n;
    pending_drops = d > 255 ? 255 : (uint8_t) d;
}

ISR(TIMER1_CAPT_vect) {
    uint16_t lo = ICR1; /* first: the capture register */
    uint8_t control = TCCR1B;
    /*
     * The overflow race: Timer1 may have wrapped with its overflow interrupt not yet run (this
     * interrupt has priority, or interrupts were off). A small captured value (< 0x8000) was taken
     * after that wrap, so the pending overflow belongs before this capture; a large one was taken
     * before it. Unsigned 16-bit differences survive one wrap only, hence the halfway test.
     */
    uint32_t hi = rcb_high_part(overflows, lo, (TIFR1 & _BV(TOV1)) != 0);
    uint8_t level = (control & _BV(ICES1)) ? 1 : 0;
    if (both_edges) {
        TCCR1B = control ^ _BV(ICES1);
        TIFR1 = _BV(ICF1); /* changing ICES1 may set ICF1 (datasheet): clear it */
        /*
         * An edge that came between the capture and the toggle is lost: the pin already shows
         * the level the edge we now wait for would give. Count it and wait for the edge back.
         */
        uint8_t pin = (PINB & _BV(PINB0)) ? 1 : 0;
        if (pin != level) {
            lose(1);
            TCCR1B = pin ? (TCCR1B & ~_BV(ICES1)) : (TCCR1B | _BV(ICES1));
            TIFR1 = _BV(ICF1);
        }
    }
    uint8_t next = (ring_head + 1) & (RING - 1);
    if (next == ring_tail) {
        lose(1); /* ring full */
        return;
    }
    uint8_t h = ring_head;
    ring_lo[h] = lo;
    ring_hi[h] = hi;
    ring_level[h] = level;
    ring_drops[h] = pending_drops;
    pending_drops = 0;
    ring_head = next;
}

/* The current 48-bit tick, with the same overflow rule. Interrupts must be off. */
static uint64_t now_locked(void) {
    uint16_t lo = TCNT1;
    uint32_t hi = rcb_high_part(overflows, lo, (TIFR1 & _BV(TOV1)) != 0);
    return ((uint64_t) hi << 16) | lo;
}

static void capture_arm(void) {
    ATOMIC_BLOCK(ATOMIC_RESTORESTATE) {
        /* Wait for the edge away from the present level. */
        if (PINB & _BV(PINB0)) {
            TCCR1B &= ~_BV(ICES1);
        } else {
            TCCR1B |= _BV(ICES1);
        }
        TIFR1 = _BV(ICF1);
        TIMSK1 |= _BV(ICIE1);
    }
}

static void capture_disarm(void) {
    ATOMIC_BLOCK(ATOMIC_RESTORESTATE) {
        TIMSK1 &= ~_BV(ICIE1);
    }
}

/* ---- UART ---------------------------------------------------------------------------------- */

#define TX_RING 128
static volatile uint8_t tx_buf[TX_RING];
static volatile uint8_t tx_head, tx_tail;
#define RX_RING 64
static volatile uint8_t rx_buf[RX_RING];
static volatile uint8_t rx_head, rx_tail;

ISR(USART_UDRE_vect) {
    if (tx_head == tx_tail) {
        UCSR0B &= ~_BV(UDRIE0);
        return;
    }
    UDR0 = tx_buf[tx_tail];
    tx_tail = (tx_tail + 1) & (TX_RING - 1);
}

ISR(USART_RX_vect) {
    uint8_t b = UDR0;
    uint8_t next = (rx_head + 1) & (RX_RING - 1);
    if (next != rx_tail) {
        rx_buf[rx_head] = b;
        rx_head = next;
    }
}

static void uart_init(void) {
    UCSR0A = _BV(U2X0);
    UBRR0 = (uint16_t) (F_CPU / (8UL * BAUD) - 1); /* 3 at 16 MHz: exact 500 000 baud */
    UCSR0C = _BV(UCSZ01) | _BV(UCSZ00);            /* 8N1 */
    UCSR0B = _BV(RXEN0) | _BV(TXEN0) | _BV(RXCIE0);
}

static void uart_put(uint8_t b) {
    uint8_t next = (tx_head + 1) & (TX_RING - 1);
    while (next == tx_tail) {
        /* wait for the UART: the capture interrupt keeps running meanwhile */
    }
    tx_buf[tx_head] = b;
    tx_head = next;
    UCSR0B |= _BV(UDRIE0);
}

static int uart_get(void) {
    if (rx_head == rx_tail) {
        return -1;
    }
    uint8_t b = rx_buf[rx_tail];
    rx_tail = (rx_tail + 1) & (RX_RING - 1);
    return b;
}

/* ---- frames ------------------------------------------------------------------------------- */

static uint8_t ctl_frame[64]; /* hello and acks; edges are built in frames.c */
static uint32_t last_send_tick; /* low 32 bits of the tick when the last frame went out */

void rcb_put(uint8_t b) {
    uart_put(b);
}

void rcb_sent(void) {
    ATOMIC_BLOCK(ATOMIC_RESTORESTATE) {
        last_send_tick = (uint32_t) now_locked();
    }
}

static uint8_t put_u32(uint8_t *frame, uint8_t at, uint32_t v) {
    for (uint8_t i = 0; i < 4; i++) {
        frame[at++] = (uint8_t) (v >> (8 * i));
    }
    return at;
}

static uint8_t running;

static void send_hello(uint8_t at_boot) {
    uint8_t *frame = ctl_frame;
    uint8_t p = RCB_HEADER;
    uint8_t id[8];
    uint32_t cal_ppb, cal_u_ppb;
    eeprom_read_block(id, (const void *) 0, 8);
    cal_ppb = eeprom_read_dword((const uint32_t *) 8);
    cal_u_ppb = eeprom_read_dword((const uint32_t *) 12);
    uint8_t erased = 1;
    for (uint8_t i = 0; i < 8; i++) {
        erased &= id[i] == 0xFF;
    }
    uint8_t calibrated = cal_ppb != 0xFFFFFFFFUL && cal_u_ppb != 0xFFFFFFFFUL;
    frame[p++] = RCB_PROTOCOL_VERSION;
    frame[p++] = (at_boot ? RCB_HELLO_AT_BOOT : 0) | (calibrated ? RCB_HELLO_CALIBRATED : 0)
            | RCB_HELLO_HEARTBEAT | (running ? RCB_HELLO_RUNNING : 0);
    frame[p++] = FW_MAJOR;
    frame[p++] = FW_MINOR;
    frame[p++] = FW_PATCH;
    for (uint8_t i = 0; i < 8; i++) {
        frame[p++] = erased ? 0 : id[i];
    }
    p = put_u32(frame, p, F_CPU);
    frame[p++] = CLOCK_SOURCE;
    p = put_u32(frame, p, calibrated ? cal_ppb : 0);
    p = put_u32(frame, p, calibrated ? cal_u_ppb : 0);
    frame[p++] = 1; /* one channel: ICP1 */
    frame[p++] = RCB_CAP_RISING | RCB_CAP_FALLING | RCB_CAP_BOTH | RCB_CAP_NOISE_FILTER;
    p = put_u32(frame, p, MAX_EDGE_RATE);
    frame[p++] = 0; /* no ADC in this firmware */
    frame[p++] = 0;
    p = put_u32(frame, p, 0);
    frame[p++] = sizeof PROBE_NAME - 1;
    memcpy(&frame[p], PROBE_NAME, sizeof PROBE_NAME - 1);
    p += sizeof PROBE_NAME - 1;
    rcb_send_frame(frame, RCB_T_HELLO, p - RCB_HEADER);
}

static void send_ack(uint8_t type, uint8_t seq, uint8_t status) {
    ctl_frame[2] = type;
    ctl_frame[3] = seq;
    ctl_frame[4] = status;
    rcb_send_frame(ctl_frame, RCB_T_ACK, 3);
}

/* ---- edge frames -------------------------------------------------------------------------- */

/* Moves captured edges from the ring into frames; flushes and sends heartbeats on time. */
static void edges_service(void) {
    while (ring_tail != ring_head) {
        uint8_t t = ring_tail;
        uint64_t tick = ((uint64_t) ring_hi[t] << 16) | ring_lo[t];
        uint8_t level = ring_level[t];
        uint8_t drops = ring_drops[t];
        ring_tail = (t + 1) & (RING - 1);
        rcb_edges_add(tick, 0, level, drops);
    }
    uint64_t now;
    uint8_t quiet;
    uint8_t late_drops;
    ATOMIC_BLOCK(ATOMIC_FORCEON) {
        now = now_locked();
        /* No heartbeat while an edge is stored or latched but not yet stored: it would predate it. */
        quiet = ring_tail == ring_head && !(TIFR1 & _BV(ICF1));
        late_drops = pending_drops;
        if (quiet) {
            pending_drops = 0;
        }
    }
    if (rcb_edges_pending() && now - rcb_edges_first() >= FLUSH_TICKS) {
        rcb_edges_flush();
    }
    if (quiet && !rcb_edges_pending() && ((uint32_t) now - last_send_tick >= HEARTBEAT_TICKS || late_drops)) {
        rcb_edges_heartbeat(now, late_drops);
    }
}

/* ---- commands ----------------------------------------------------------------------------- */

static uint8_t cmd[32]; /* host commands are at most 12 bytes encoded; longer blocks are not ours */
static uint8_t cmd_len;
static uint8_t cmd_overflow;
static uint8_t line_query; /* the current text line so far is "?" */
static uint8_t line_len;

static void handle_command(uint8_t type, uint8_t seq, const uint8_t *p, uint8_t len) {
    switch (type) {
    case RCB_T_HELLO_REQUEST:
        send_hello(0);
        send_ack(type, seq, RCB_ACK_OK);
        break;
    case RCB_T_START:
        if (!running) {
            ATOMIC_BLOCK(ATOMIC_FORCEON) {
                ring_tail = ring_head;
                pending_drops = 0;
            }
            rcb_edges_reset();
            running = 1;
            capture_arm();
        }
        send_ack(type, seq, RCB_ACK_OK);
        break;
    case RCB_T_STOP:
        capture_disarm();
        running = 0;
        edges_service();
        rcb_edges_flush();
        send_ack(type, seq, RCB_ACK_OK);
        break;
    case RCB_T_SET_EDGES: {
        if (len < 3 || (p[0] & ~1) || (p[0] && !((p[1] | p[2]) & 1))) {
            send_ack(type, seq, RCB_ACK_BAD_ARGUMENT);
            break;
        }
        uint8_t rising = p[1] & p[0] & 1, falling = p[2] & p[0] & 1;
        ATOMIC_BLOCK(ATOMIC_FORCEON) {
            both_edges = rising && falling;
            if (!both_edges && rising) {
                TCCR1B |= _BV(ICES1);
            } else if (!both_edges && falling) {
                TCCR1B &= ~_BV(ICES1);
            }
            TIFR1 = _BV(ICF1);
        }
        if (!p[0]) {
            capture_disarm();
        } else if (running) {
            capture_arm();
            if (!both_edges) {
                /* capture_arm() chose by level; a single polarity overrides it */
                if (rising) {
                    TCCR1B |= _BV(ICES1);
                } else {
                    TCCR1B &= ~_BV(ICES1);
                }
            }
        }
        send_ack(type, seq, RCB_ACK_OK);
        break;
    }
    case RCB_T_SET_ADC:
        send_ack(type, seq, RCB_ACK_UNSUPPORTED);
        break;
    default:
        send_ack(type, seq, RCB_ACK_UNKNOWN_COMMAND);
        break;
    }
}

static void commands_service(void) {
    for (int c; (c = uart_get()) >= 0;) {
        uint8_t b = (uint8_t) c;
        /* Text-mode hello request: a line holding only '?'. */
        if (b == '\n') {
            if (line_query && line_len == 1) {
                send_hello(0);
            }
            line_len = 0;
            line_query = 0;
        } else if (b != '\r') {
            line_query = line_len == 0 && b == '?';
            if (line_len < 255) {
                line_len++;
            }
        }
        if (b != RCB_DELIMITER) {
            if (cmd_len < sizeof cmd) {
                cmd[cmd_len++] = b;
            } else {
                cmd_overflow = 1;
            }
            continue;
        }
        int16_t n = cmd_overflow || cmd_len == 0 ? -1 : rcb_cobs_decode(cmd, cmd_len);
        cmd_len = 0;
        cmd_overflow = 0;
        if (n < RCB_HEADER + RCB_TRAILER) {
            continue;
        }
        uint16_t crc = 0xFFFF;
        for (int16_t i = 0; i < n - RCB_TRAILER; i++) {
            crc = rcb_crc_update(crc, cmd[i]);
        }
        if (crc != (uint16_t) (cmd[n - 2] | (cmd[n - 1] << 8))) {
            continue; /* the host repeats what is not acknowledged */
        }
        handle_command(cmd[0], cmd[1], &cmd[RCB_HEADER], (uint8_t) (n - RCB_HEADER - RCB_TRAILER));
    }
}

/* ---- main --------------------------------------------------------------------------------- */

int main(void) {
    DDRB &= ~_BV(DDB0);  /* ICP1 input */
    PORTB &= ~_BV(PORTB0); /* no pull-up: the front end drives the pin */
    TCCR1A = 0;
    TCCR1B = _BV(ICNC1) | _BV(ICES1) | _BV(CS10); /* noise canceller, rising first, 16 MHz ticks */
    TIMSK1 = _BV(TOIE1);
    uart_init();
    sei();
    uart_put(RCB_DELIMITER); /* end whatever noise came before */
    send_hello(1);
    for (;;) {
        commands_service();
        if (running) {
            edges_service();
        }
    }
}
