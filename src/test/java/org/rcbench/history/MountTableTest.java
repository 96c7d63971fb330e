package org.rcbench.history;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class MountTableTest {
    // Lines in the format of proc(5) /proc/mounts: device, mount point (octal escapes), type, options, 0 0.
    static final MountTable TABLE = MountTable.parse("""
            /dev/nvme0n1p2 / ext4 rw,relatime 0 0
            proc /proc proc rw 0 0
            server:/export/home /home/shared nfs4 rw,vers=4.2 0 0
            //nas/bench /mnt/bench\\040files cifs rw 0 0
            user@host:/data /mnt/remote fuse.sshfs rw 0 0
            /dev/sdb1 /mnt/usb fuseblk rw 0 0
            /dev/sdc1 /home/shared/local ext4 rw 0 0
            """);

    @ParameterizedTest
    @CsvSource({"/home/user/.local/share/rcbench, ", "/home/shared/alice, nfs4", "/mnt/bench files/x, cifs",
        "/mnt/remote/db, fuse.sshfs", "/mnt/usb/db, ", "/home/shared/local/db, "})
    void theLongestMountPointDecidesTheFileSystem(String dir, String network) {
        assertThat(TABLE.networkTypeOf(Path.of(dir)).orElse(null)).isEqualTo(network);
    }

    @Test
    void networkTypes() {
        for (String t : new String[] {"nfs", "nfs4", "cifs", "smb3", "fuse.sshfs", "fuse.rclone", "9p", "ceph"}) {
            assertThat(MountTable.isNetworkType(t)).as(t).isTrue();
        }
        for (String t : new String[] {"ext4", "xfs", "btrfs", "tmpfs", "overlay", "fuseblk", "zfs", "apfs"}) {
            assertThat(MountTable.isNetworkType(t)).as(t).isFalse();
        }
    }

    @Test
    void anUnreadableTableSaysNothing() {
        assertThat(MountTable.read(Path.of("/no/such/mounts")).networkTypeOf(Path.of("/"))).isEmpty();
    }

    @Test
    void defaultFolderFollowsEachPlatformsCustom() {
        Path home = Path.of("/home/u");
        // XDG Base Directory Specification: $XDG_DATA_HOME if set and absolute, else ~/.local/share
        assertThat(DataFolder.defaultDatabase("Linux", Map.of(), home))
                .isEqualTo(Path.of("/home/u/.local/share/rcbench/history.db"));
        assertThat(DataFolder.defaultDatabase("Linux", Map.of("XDG_DATA_HOME", "/data/u"), home))
                .isEqualTo(Path.of("/data/u/rcbench/history.db"));
        assertThat(DataFolder.defaultDatabase("Linux", Map.of("XDG_DATA_HOME", "relative"), home))
                .isEqualTo(Path.of("/home/u/.local/share/rcbench/history.db"));
        assertThat(DataFolder.defaultDatabase("Mac OS X", Map.of(), Path.of("/Users/u")))
                .isEqualTo(Path.of("/Users/u/Library/Application Support/rcbench/history.db"));
        assertThat(DataFolder.defaultDatabase("FreeBSD", Map.of(), home))
                .isEqualTo(Path.of("/home/u/.local/share/rcbench/history.db"));
    }
}
