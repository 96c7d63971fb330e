package org.rcbench.cli;

import java.io.PrintWriter;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;

/** The channel a command uses: {@code --channel} when given, else the capture's lowest-numbered channel (0 if it names none). */
final class CaptureChannel {
    private CaptureChannel() {
    }

    static int of(Capture capture, String spec) {
        if (spec != null) {
            return CaptureFiles.selectChannel(capture, spec);
        }
        int min = 0;
        boolean first = true;
        for (int ch : capture.channels().keySet()) {
            if (first || ch < min) {
                min = ch;
                first = false;
            }
        }
        return min;
    }

    /** Prints the capture's warnings on {@code err}, one line each. */
    static void warn(Capture capture, PrintWriter err) {
        for (String w : capture.warnings()) {
            err.println("rcbench: warning: " + w);
        }
        err.flush();
    }
}
