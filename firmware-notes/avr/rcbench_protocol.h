/*
 * rcbench probe wire protocol, version 1: the numbers of firmware-notes/protocol.md.
 * Kept equal to org.rcbench.protocol.Wire by a test (FirmwareBuildTest parses this file).
 */
#ifndef RCBENCH_PROTOCOL_H
#define RCBENCH_PROTOCOL_H

#define RCB_PROTOCOL_VERSION 1

#define RCB_DELIMITER 0x00
#define RCB_MAX_FRAME 254       /* type + seq + payload + CRC, before COBS */
#define RCB_HEADER 2
#define RCB_TRAILER 2
#define RCB_MAX_PAYLOAD 250
#define RCB_MAX_ENCODED 255     /* COBS adds one byte to frames of up to 254 bytes */

/* Probe to host. */
#define RCB_T_HELLO 0x01
#define RCB_T_EDGES 0x02
#define RCB_T_ADC 0x03
#define RCB_T_ACK 0x04
#define RCB_T_NOTE 0x05

/* Host to probe. */
#define RCB_T_HELLO_REQUEST 0x10
#define RCB_T_START 0x11
#define RCB_T_STOP 0x12
#define RCB_T_SET_EDGES 0x13
#define RCB_T_SET_ADC 0x14

/* Hello flags. */
#define RCB_HELLO_AT_BOOT 0x01
#define RCB_HELLO_CALIBRATED 0x02
#define RCB_HELLO_HEARTBEAT 0x04
#define RCB_HELLO_RUNNING 0x08

/* Edge capabilities. */
#define RCB_CAP_RISING 0x01
#define RCB_CAP_FALLING 0x02
#define RCB_CAP_BOTH 0x04
#define RCB_CAP_NOISE_FILTER 0x08

/* Acknowledgement status. */
#define RCB_ACK_OK 0
#define RCB_ACK_UNKNOWN_COMMAND 1
#define RCB_ACK_BAD_ARGUMENT 2
#define RCB_ACK_UNSUPPORTED 3

/* Payload layouts. */
#define RCB_HELLO_FIXED 39
#define RCB_MAX_NAME 32
#define RCB_EDGES_FIXED 10
#define RCB_ADC_FIXED 18
#define RCB_MAX_EDGE_CHANNELS 8
#define RCB_MAX_ITEM_BYTES 9

/* Clock sources in the hello frame. */
#define RCB_CLOCK_UNKNOWN 0
#define RCB_CLOCK_CRYSTAL 1
#define RCB_CLOCK_RESONATOR 2
#define RCB_CLOCK_INTERNAL_RC 3
#define RCB_CLOCK_REFERENCE 4

#endif
