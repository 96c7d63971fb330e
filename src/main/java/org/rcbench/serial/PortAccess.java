package org.rcbench.serial;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

/**
 * Whether the current user may open a serial device, and if not, exactly what to do. Reads the
 * device's owning group, {@code /etc/group} and this process's groups ({@code /proc/self/status})
 * on Linux; elsewhere it only reports readable/writable. Thread-safe, no state.
 */
public final class PortAccess {

    /**
     * @param ok     the device exists and this process may read and write it
     * @param advice empty when ok, else one sentence saying what to do
     */
    public record Verdict(boolean ok, String advice) {
    }

    private PortAccess() {
    }

    /** Checks {@code device} (a symlink is followed). */
    public static Verdict check(Path device) {
        if (!Files.exists(device)) {
            return new Verdict(false, "it does not exist: is the probe plugged in? (device names can change when it is "
                    + "plugged in again; /dev/serial/by-id/ names do not)");
        }
        if (Files.isReadable(device) && Files.isWritable(device)) {
            return new Verdict(true, "");
        }
        String group;
        int gid;
        try {
            group = Files.readAttributes(device, java.nio.file.attribute.PosixFileAttributes.class).group().getName();
            gid = (Integer) Files.getAttribute(device, "unix:gid");
        } catch (IOException | UnsupportedOperationException | IllegalArgumentException | ClassCastException e) {
            return new Verdict(false, "this user may not read and write it; ask the administrator for access");
        }
        String user = System.getProperty("user.name", "");
        boolean listed = memberInGroupFile(readOrEmpty(Path.of("/etc/group")), group, user);
        boolean active = processHasGroup(readOrEmpty(Path.of("/proc/self/status")), gid);
        return new Verdict(false, advice(group, listed, active));
    }

    /**
     * What to tell a user who may not open a device owned by {@code group}: {@code listed} when
     * {@code /etc/group} already names them, {@code active} when this login session has the group.
     */
    static String advice(String group, boolean listed, boolean active) {
        if (listed && !active) {
            return "you are in group " + group + " but this login session started before that: log out and in "
                    + "again (or run 'newgrp " + group + "' in this terminal)";
        }
        if (active) {
            return "group " + group + " may use it but the device's own permissions forbid it: ask the administrator";
        }
        return "permission denied: add yourself to group " + group + " with 'sudo usermod -aG " + group
                + " $USER', then log out and in again (serial devices belong to dialout on Debian, Ubuntu and "
                + "Fedora, and to uucp on Arch)";
    }

    /** Whether {@code user} is listed as a member of {@code group} in /etc/group text. */
    static boolean memberInGroupFile(String etcGroup, String group, String user) {
        for (String line : etcGroup.split("\n")) {
            String[] f = line.split(":", -1);
            if (f.length >= 4 && f[0].equals(group)) {
                List<String> members = Arrays.asList(f[3].trim().split(","));
                return members.contains(user);
            }
        }
        return false;
    }

    /** Whether the {@code Groups:} line of /proc/self/status text contains {@code gid}. */
    static boolean processHasGroup(String procStatus, int gid) {
        for (String line : procStatus.split("\n")) {
            if (line.startsWith("Groups:")) {
                for (String g : line.substring(7).trim().split("\\s+")) {
                    if (g.equals(Integer.toString(gid))) {
                        return true;
                    }
                }
            }
        }
        return false;
    }

    /**
     * A note for {@code ttyACM} devices while ModemManager runs (it probes new modems-to-be for about
     * ten seconds after plug-in and can hold or confuse the port), else "".
     */
    public static String modemManagerNote(Path device) {
        if (!device.toString().contains("ttyACM") && !device.toString().contains("by-id")) {
            return "";
        }
        try (var procs = Files.list(Path.of("/proc"))) {
            boolean running = procs.filter(p -> p.getFileName().toString().chars().allMatch(Character::isDigit))
                    .anyMatch(p -> readOrEmpty(p.resolve("comm")).trim().equals("ModemManager"));
            return running ? "ModemManager is running: it may hold a new ttyACM port for about 10 s after plug-in; "
                    + "wait, or add a udev rule with ENV{ID_MM_DEVICE_IGNORE}=\"1\" for the probe" : "";
        } catch (IOException | RuntimeException e) {
            return "";
        }
    }

    private static String readOrEmpty(Path p) {
        try {
            return Files.readString(p);
        } catch (IOException | RuntimeException e) {
            return "";
        }
    }
}
