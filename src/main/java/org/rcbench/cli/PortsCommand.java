package org.rcbench.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.rcbench.common.BadInputException;
import org.rcbench.serial.PortAccess;
import org.rcbench.serial.PortInfo;
import org.rcbench.serial.SerialPorts;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code rcbench ports [DEVICE...]}: lists serial ports, or checks the given devices, and says how to get access. */
@Command(name = "ports", mixinStandardHelpOptions = true,
        description = {"List serial ports a probe may be on, with USB ids and whether you may open them.",
            "With DEVICE arguments, check those paths instead (pseudo-terminals are not listed but can be checked)."})
public final class PortsCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(arity = "0..*", paramLabel = "DEVICE", description = "Device paths to check, e.g. /dev/ttyUSB0.")
    List<String> devices = List.of();

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        if (!devices.isEmpty()) {
            for (String d : devices) {
                PortAccess.Verdict v = PortAccess.check(Path.of(d));
                if (!v.ok() && v.advice().startsWith("it does not exist")) {
                    throw new BadInputException(d, "no such port: is the probe plugged in?");
                }
                out.println(d + "  " + (v.ok() ? "ok: you may open it" : v.advice()));
                printNote(out, Path.of(d));
            }
            return ExitCodes.OK;
        }
        List<PortInfo> ports = SerialPorts.list();
        if (ports.isEmpty()) {
            out.println("no serial ports found. Plug the probe in and look again; pseudo-terminals are not listed "
                    + "but open by path.");
            return ExitCodes.OK;
        }
        for (PortInfo p : ports) {
            out.println(p.path() + "  " + (p.usbId().isEmpty() ? "(no USB id)" : p.usbId()) + "  "
                    + p.description());
            for (String link : p.stableLinks()) {
                out.println("    also " + link);
            }
            out.println("    " + (p.access().ok() ? "ok: you may open it" : p.access().advice()));
            printNote(out, Path.of(p.path()));
        }
        out.println("Open a probe by path or by USB id (vvvv:pppp or vvvv:pppp:serial): the id finds it again after "
                + "it is plugged back in.");
        return ExitCodes.OK;
    }

    private static void printNote(PrintWriter out, Path device) {
        String note = PortAccess.modemManagerNote(device);
        if (!note.isEmpty()) {
            out.println("    note: " + note);
        }
    }
}
