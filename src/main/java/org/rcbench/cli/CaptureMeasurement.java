package org.rcbench.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.MonostableMeter;
import org.rcbench.measure.MonostableMeter.MonostableResult;

/**
 * A capture file read through the cycle meter (and the monostable meter when a trigger channel is
 * given): what {@code check} and {@code tune} start from. Capture warnings go to {@code err}.
 *
 * @param meter the cycle meter after the whole file
 * @param mono  the monostable figures, or null without a trigger channel
 */
record CaptureMeasurement(CycleMeter meter, MonostableResult mono) {
    static CaptureMeasurement read(Path file, CaptureOptions options, PrintWriter err) throws IOException {
        try (Capture capture = CaptureFiles.open(file)) {
            int ch = options.channel(capture);
            Timebase timebase = options.timebase(capture);
            CycleMeter meter = new CycleMeter(options.config(ch, timebase));
            int trig = options.triggerChannel(capture, ch);
            MonostableMeter mono = trig < 0 ? null : new MonostableMeter(trig, ch, options.activeLevel(), timebase);
            capture.streamTo(mono == null ? meter : new FanOut(new EdgeSink[] {meter, mono}));
            for (String w : capture.warnings()) {
                err.println("rcbench: warning: " + w);
            }
            return new CaptureMeasurement(meter, mono == null ? null : mono.result());
        }
    }
}
