package org.rcbench.protocol;

import java.util.Locale;

/**
 * The text-mode hello line: {@code H clock_hz=16000000 probe_id=c0ffee01 fw=0.3.1 channels=1
 * clock_source=crystal cal_ppm=-12.5 cal_u_ppm=0.8 name=my-probe boot=1}. Only {@code clock_hz}
 * is required; keys are lowercase, unknown keys are ignored, values have no spaces.
 */
final class TextHello {
    private TextHello() {
    }

    /** The hello on a line after its {@code "H "}, or null when the line is not a valid hello. */
    static Hello parse(String fields) {
        long clockHz = -1;
        long probeId = 0;
        String fw = "0.0.0";
        int channels = 1;
        ClockSource source = ClockSource.UNKNOWN;
        double calPpm = Double.NaN;
        double calUPpm = 0;
        String name = "";
        int flags = 0;
        try {
            for (String token : fields.trim().split("[ \t]+")) {
                int eq = token.indexOf('=');
                if (eq <= 0) {
                    return null;
                }
                String key = token.substring(0, eq);
                String value = token.substring(eq + 1);
                switch (key) {
                    case "clock_hz" -> clockHz = Long.parseLong(value);
                    case "probe_id" -> probeId = Long.parseUnsignedLong(value, 16);
                    case "fw" -> fw = value;
                    case "channels" -> channels = Integer.parseInt(value);
                    case "clock_source" -> source = ClockSource.ofWord(value);
                    case "cal_ppm" -> calPpm = Double.parseDouble(value);
                    case "cal_u_ppm" -> calUPpm = Double.parseDouble(value);
                    case "name" -> name = value;
                    case "boot" -> flags |= "1".equals(value) ? Wire.HELLO_AT_BOOT : 0;
                    default -> {
                        // Keys this host does not know are ignored.
                    }
                }
            }
            if (clockHz <= 0 || clockHz > 0xFFFF_FFFFL || channels < 1 || channels > 255
                    || name.length() > Wire.MAX_NAME || !(Math.abs(calUPpm) < 1e6)) {
                return null;
            }
            int calPpb = 0;
            if (!Double.isNaN(calPpm)) {
                if (!(Math.abs(calPpm) < 2e6)) {
                    return null;
                }
                calPpb = (int) Math.round(calPpm * 1000);
                flags |= Wire.HELLO_CALIBRATED;
            }
            return new Hello(Wire.PROTOCOL_VERSION, flags, fw, probeId, clockHz, source, calPpb,
                    Math.round(Math.abs(calUPpm) * 1000), channels,
                    Wire.CAP_RISING | Wire.CAP_FALLING | Wire.CAP_BOTH, 0, 0, 0, 0, name);
        } catch (NumberFormatException e) {
            return null;
        }
    }

    /** The line (without its newline) a text-mode probe would print for {@code hello}. */
    static String format(Hello hello) {
        StringBuilder sb = new StringBuilder("H clock_hz=").append(hello.clockHz());
        sb.append(" probe_id=").append(Long.toHexString(hello.probeId()));
        sb.append(" fw=").append(hello.firmwareVersion());
        sb.append(" channels=").append(hello.channelCount());
        sb.append(" clock_source=").append(hello.clockSource().word());
        if (hello.calibrated()) {
            sb.append(String.format(Locale.ROOT, " cal_ppm=%.3f cal_u_ppm=%.3f", hello.calibrationPpm(),
                    hello.calibrationUncertaintyPpb() * 1e-3));
        }
        if (!hello.name().isEmpty()) {
            sb.append(" name=").append(hello.name());
        }
        if (hello.atBoot()) {
            sb.append(" boot=1");
        }
        return sb.toString();
    }
}
