package org.rcbench.protocol;

import java.util.ArrayList;
import java.util.List;
import org.rcbench.edge.EdgeSink;

/** Records every sink call and event as text lines, for comparing decodes. */
final class Recorder implements EdgeSink, ProbeEvents {
    final List<String> calls = new ArrayList<>();
    final List<Hello> hellos = new ArrayList<>();
    final List<Ack> acks = new ArrayList<>();
    final List<Trouble> troubles = new ArrayList<>();
    final List<String> notes = new ArrayList<>();
    final List<String> adc = new ArrayList<>();
    long lastTick = -1;
    boolean ended;
    long endTick = -1;
    long edges;
    long gaps;
    boolean monotonic = true;

    @Override
    public void onEdge(long tick, int channel, int level) {
        if (tick < lastTick || tick < 0 || channel < 0 || channel > 255 || level < -1 || level > 1) {
            monotonic = false;
        }
        lastTick = tick;
        if (level == UNKNOWN) {
            gaps++;
        } else {
            edges++;
        }
        calls.add(tick + " " + channel + " " + (level == UNKNOWN ? "?" : Integer.toString(level)));
    }

    @Override
    public void onEnd(long tick) {
        ended = true;
        endTick = tick;
    }

    @Override
    public void onHello(Hello hello) {
        hellos.add(hello);
        calls.add("hello " + hello.probeIdHex());
    }

    @Override
    public void onAck(Ack ack) {
        acks.add(ack);
        calls.add("ack " + ack);
    }

    @Override
    public void onNote(String text) {
        notes.add(text);
        calls.add("note " + text);
    }

    @Override
    public void onTrouble(Trouble trouble, long tick) {
        troubles.add(trouble);
        calls.add("trouble " + trouble + " " + tick);
    }

    @Override
    public void onAdc(int channel, int resolutionBits, int fullScaleMv, long firstTick, long periodTicks,
            int[] samples, int count) {
        StringBuilder sb = new StringBuilder();
        sb.append(channel).append(' ').append(resolutionBits).append(' ').append(fullScaleMv).append(' ')
                .append(firstTick).append(' ').append(periodTicks).append(':');
        for (int i = 0; i < count; i++) {
            sb.append(' ').append(samples[i]);
        }
        adc.add(sb.toString());
        calls.add("adc " + sb);
    }

    /** Only the edge and gap calls, as "tick channel level". */
    List<String> edgeCalls() {
        List<String> out = new ArrayList<>();
        for (String c : calls) {
            if (Character.isDigit(c.charAt(0))) {
                out.add(c);
            }
        }
        return out;
    }

    static Recorder decode(byte[] bytes) {
        Recorder r = new Recorder();
        StreamDecoder d = new StreamDecoder(r, r);
        d.feed(bytes);
        d.end();
        return r;
    }
}
