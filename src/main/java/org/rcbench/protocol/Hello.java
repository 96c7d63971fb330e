package org.rcbench.protocol;

import java.util.Locale;

/**
 * What a probe says about itself in its hello frame (binary) or {@code H} line (text mode).
 *
 * @param protocolVersion           wire protocol version the probe speaks (1)
 * @param flags                     {@code Wire.HELLO_*} bits: sent at boot, calibrated, heartbeats, running
 * @param firmwareVersion           firmware version as {@code major.minor.patch}
 * @param probeId                   the probe's own 64-bit identity (0 = none); stable across resets
 * @param clockHz                   nominal timestamp clock in hertz, &gt; 0
 * @param clockSource               what sets that clock
 * @param calibrationPpb            stored clock offset in parts per billion (positive: the clock runs fast)
 * @param calibrationUncertaintyPpb standard uncertainty of that offset in parts per billion, &ge; 0
 * @param channelCount              edge channels, 1..8 in binary mode
 * @param edgeCapabilities          {@code Wire.CAP_*} bits
 * @param maxEdgeRate               sustained edges per second the probe can timestamp (0 = not stated)
 * @param adcChannels               ADC channels (0 = no ADC)
 * @param adcResolutionBits         ADC resolution in bits (0 when there is no ADC)
 * @param adcMaxRateHz              highest ADC sample rate in hertz (0 when there is no ADC)
 * @param name                      short ASCII name of the probe or board, at most 32 characters
 */
public record Hello(int protocolVersion, int flags, String firmwareVersion, long probeId, long clockHz,
        ClockSource clockSource, int calibrationPpb, long calibrationUncertaintyPpb, int channelCount,
        int edgeCapabilities, long maxEdgeRate, int adcChannels, int adcResolutionBits, long adcMaxRateHz,
        String name) {

    public Hello {
        if (clockHz <= 0 || clockHz > 0xFFFF_FFFFL) {
            throw new IllegalArgumentException("clockHz out of 1..2^32-1: " + clockHz);
        }
        if (channelCount < 1 || channelCount > 255) {
            throw new IllegalArgumentException("channelCount out of 1..255: " + channelCount);
        }
        if (calibrationUncertaintyPpb < 0) {
            throw new IllegalArgumentException("calibrationUncertaintyPpb < 0: " + calibrationUncertaintyPpb);
        }
        if (name.length() > Wire.MAX_NAME) {
            throw new IllegalArgumentException("name longer than " + Wire.MAX_NAME + ": " + name);
        }
    }

    /** A minimal hello: one channel, both edges, no ADC, no calibration, version 1 firmware. */
    public static Hello basic(long probeId, long clockHz, ClockSource source, String name) {
        return new Hello(Wire.PROTOCOL_VERSION, 0, "1.0.0", probeId, clockHz, source, 0, 0, 1,
                Wire.CAP_RISING | Wire.CAP_FALLING | Wire.CAP_BOTH, 0, 0, 0, 0, name);
    }

    /** True when the probe sent this hello because it has just reset. */
    public boolean atBoot() {
        return (flags & Wire.HELLO_AT_BOOT) != 0;
    }

    /** True when the probe holds a stored calibration. */
    public boolean calibrated() {
        return (flags & Wire.HELLO_CALIBRATED) != 0;
    }

    /** True when the probe promises a heartbeat at least every 250 ms while running. */
    public boolean sendsHeartbeats() {
        return (flags & Wire.HELLO_HEARTBEAT) != 0;
    }

    /** Stored calibration offset in ppm. */
    public double calibrationPpm() {
        return calibrationPpb * 1e-3;
    }

    /** The probe id as 16 lowercase hex digits, as shown to users and stored with calibrations. */
    public String probeIdHex() {
        return String.format(Locale.ROOT, "%016x", probeId);
    }

    public Hello withFlags(int newFlags) {
        return new Hello(protocolVersion, newFlags, firmwareVersion, probeId, clockHz, clockSource, calibrationPpb,
                calibrationUncertaintyPpb, channelCount, edgeCapabilities, maxEdgeRate, adcChannels,
                adcResolutionBits, adcMaxRateHz, name);
    }

    public Hello withCalibration(int ppb, long uncertaintyPpb) {
        return new Hello(protocolVersion, flags | Wire.HELLO_CALIBRATED, firmwareVersion, probeId, clockHz,
                clockSource, ppb, uncertaintyPpb, channelCount, edgeCapabilities, maxEdgeRate, adcChannels,
                adcResolutionBits, adcMaxRateHz, name);
    }

    public Hello withChannels(int count) {
        return new Hello(protocolVersion, flags, firmwareVersion, probeId, clockHz, clockSource, calibrationPpb,
                calibrationUncertaintyPpb, count, edgeCapabilities, maxEdgeRate, adcChannels, adcResolutionBits,
                adcMaxRateHz, name);
    }

    public Hello withAdc(int channels, int resolutionBits, long maxRateHz) {
        return new Hello(protocolVersion, flags, firmwareVersion, probeId, clockHz, clockSource, calibrationPpb,
                calibrationUncertaintyPpb, channelCount, edgeCapabilities, maxEdgeRate, channels, resolutionBits,
                maxRateHz, name);
    }

    /** One line for status displays, e.g. {@code probe 00000000c0ffee01 "bench-328p" fw 1.0.0, 16 MHz crystal}. */
    public String summary() {
        String mhz = clockHz % 1_000_000 == 0
                ? Long.toString(clockHz / 1_000_000)
                : String.format(Locale.ROOT, "%.6f", clockHz / 1e6);
        StringBuilder sb = new StringBuilder();
        sb.append("probe ").append(probeIdHex());
        if (!name.isEmpty()) {
            sb.append(" \"").append(name).append('"');
        }
        sb.append(" fw ").append(firmwareVersion).append(", ").append(mhz).append(" MHz ")
                .append(clockSource.word()).append(", ").append(channelCount)
                .append(channelCount == 1 ? " channel" : " channels");
        if (calibrated()) {
            sb.append(String.format(Locale.ROOT, ", calibrated %+.3f ppm", calibrationPpm()));
        }
        return sb.toString();
    }
}
