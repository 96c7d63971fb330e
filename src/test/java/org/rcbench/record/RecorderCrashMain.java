package org.rcbench.record;

import java.nio.file.Path;
import java.util.Map;
import org.rcbench.capture.EdgeCaptureFormat;
import org.rcbench.edge.Timebase;

/**
 * Child process for {@link RecorderCrashTest}: records synthetic edges slowly until killed.
 *
 * <p>Edge {@code i} is {@code (1000 i, 0, i % 2)}. After {@link #PAUSE_AFTER} edges it sends none
 * for a while and prints {@code paused written=W flushed=F}, so the test can see that the idle
 * recorder flushed on its own; then it goes on. Every 20 ms it prints {@code flushed=F}. It never
 * calls flush or close itself. Arguments: file, "gzip" or "plain".
 */
public final class RecorderCrashMain {
    static final int PAUSE_AFTER = 300;

    private RecorderCrashMain() {
    }

    public static void main(String[] args) throws InterruptedException {
        Map<String, String> header = EdgeCaptureFormat.header(Timebase.of(1e6), Map.of(0, "output"));
        RecorderOptions options = RecorderOptions.defaults().withGzip(args[1].equals("gzip")).withFlushIntervalMillis(100);
        Recorder r = Recorder.create(Path.of(args[0]), header, options);
        long i = 0;
        long lastReport = 0;
        for (;;) {
            r.onEdge(1000 * i, 0, (int) (i % 2));
            i++;
            if (i == PAUSE_AFTER) {
                Thread.sleep(1500);
                System.out.println("paused written=" + r.edgesWritten() + " flushed=" + r.edgesFlushed());
            }
            Thread.sleep(2);
            if (System.nanoTime() - lastReport > 20_000_000L) {
                lastReport = System.nanoTime();
                System.out.println("flushed=" + r.edgesFlushed());
            }
        }
    }
}
