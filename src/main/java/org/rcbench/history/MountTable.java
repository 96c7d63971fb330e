package org.rcbench.history;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

/**
 * The file system type a path lives on, from a Linux mount table ({@code /proc/mounts}, fstab
 * format, see proc(5)), and whether SQLite's WAL mode can be trusted there.
 *
 * <p>WAL needs shared memory between the processes that use a database, which network file systems
 * do not provide (SQLite documentation, "Write-Ahead Logging", section on disadvantages): those
 * get the rollback journal instead. Network means NFS, SMB/CIFS, AFS, Ceph, GlusterFS, Lustre, 9p,
 * and any FUSE file system other than {@code fuseblk} (sshfs, rclone, s3fs... whose locking cannot
 * be relied on). Immutable and thread-safe.
 */
public final class MountTable {
    private static final Set<String> NETWORK = Set.of("nfs", "nfs4", "cifs", "smb3", "smbfs", "smb", "ncpfs",
            "afs", "ceph", "glusterfs", "lustre", "gpfs", "9p", "sshfs", "davfs", "ocfs2", "gfs2", "beegfs");

    /** One line of the table. */
    public record Mount(String device, Path mountPoint, String type) {
    }

    private final List<Mount> mounts;

    private MountTable(List<Mount> mounts) {
        this.mounts = List.copyOf(mounts);
    }

    /** The table in {@code text} (fields separated by blanks, octal escapes such as {@code \040} for a space). */
    public static MountTable parse(String text) {
        List<Mount> out = new ArrayList<>();
        for (String line : text.split("\n")) {
            String[] f = line.strip().split("[ \t]+");
            if (f.length >= 3 && !f[0].startsWith("#")) {
                out.add(new Mount(unescape(f[0]), Path.of(unescape(f[1])), f[2]));
            }
        }
        return new MountTable(out);
    }

    /** The table read from {@code file}, or an empty table when it cannot be read (not Linux). */
    public static MountTable read(Path file) {
        try {
            return parse(Files.readString(file, StandardCharsets.UTF_8));
        } catch (IOException | SecurityException e) {
            return new MountTable(List.of());
        }
    }

    /** The mount whose mount point is the longest prefix of {@code path} (absolute, links resolved by the caller). */
    public Optional<Mount> mountOf(Path path) {
        Mount best = null;
        for (Mount m : mounts) {
            if (path.startsWith(m.mountPoint())
                    && (best == null || m.mountPoint().getNameCount() >= best.mountPoint().getNameCount())) {
                best = m;
            }
        }
        return Optional.ofNullable(best);
    }

    /** True when {@code type} (a mount table's third field) is a network or FUSE file system. */
    public static boolean isNetworkType(String type) {
        String t = type.toLowerCase(Locale.ROOT);
        if (t.equals("fuseblk")) {
            return false;
        }
        return NETWORK.contains(t) || t.equals("fuse") || t.startsWith("fuse.") || t.startsWith("nfs");
    }

    /**
     * The network file system {@code dir} (an existing folder) is on, or empty for a local one or
     * when the table does not say.
     */
    public Optional<String> networkTypeOf(Path dir) {
        Path real;
        try {
            real = dir.toRealPath();
        } catch (IOException e) {
            real = dir.toAbsolutePath().normalize();
        }
        return mountOf(real).map(Mount::type).filter(MountTable::isNetworkType);
    }

    private static String unescape(String s) {
        if (s.indexOf('\\') < 0) {
            return s;
        }
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '\\' && isOctal(s, i + 1)) {
                sb.append((char) Integer.parseInt(s.substring(i + 1, i + 4), 8));
                i += 3;
            } else {
                sb.append(c);
            }
        }
        return sb.toString();
    }

    private static boolean isOctal(String s, int from) {
        if (from + 3 > s.length()) {
            return false;
        }
        for (int i = from; i < from + 3; i++) {
            if (s.charAt(i) < '0' || s.charAt(i) > '7') {
                return false;
            }
        }
        return true;
    }
}
