package org.rcbench.serial;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.common.BadInputException;
import org.rcbench.probe.DtrPolicy;

class PortAccessTest {
    static final String ETC_GROUP = "root:x:0:\ndialout:x:20:alice,bob\nuucp:x:14:\n";

    @Test
    void membershipIsReadFromTheGroupFile() {
        assertThat(PortAccess.memberInGroupFile(ETC_GROUP, "dialout", "bob")).isTrue();
        assertThat(PortAccess.memberInGroupFile(ETC_GROUP, "dialout", "carol")).isFalse();
        assertThat(PortAccess.memberInGroupFile(ETC_GROUP, "uucp", "alice")).isFalse();
    }

    @Test
    void processGroupsAreReadFromProcStatus() {
        String status = "Name:\tjava\nUid:\t1000\t1000\t1000\t1000\nGroups:\t4 20 27 1000 \n";
        assertThat(PortAccess.processHasGroup(status, 20)).isTrue();
        assertThat(PortAccess.processHasGroup(status, 14)).isFalse();
    }

    @Test
    void notInTheGroupSaysWhichGroupAndThatReloginIsNeeded() {
        assertThat(PortAccess.advice("dialout", false, false))
                .contains("sudo usermod -aG dialout $USER")
                .contains("log out and in again")
                .contains("uucp on Arch");
    }

    @Test
    void addedButNotYetEffectiveSaysToLogInAgain() {
        assertThat(PortAccess.advice("uucp", true, false)).startsWith("you are in group uucp")
                .contains("log out and in again").contains("newgrp uucp");
    }

    @Test
    void missingDeviceIsNotOk(@TempDir Path dir) {
        PortAccess.Verdict v = PortAccess.check(dir.resolve("ttyACM9"));
        assertThat(v.ok()).isFalse();
        assertThat(v.advice()).contains("plugged in");
    }

    @Test
    void openingAMissingPortIsOneLineNamingIt(@TempDir Path dir) {
        String path = dir.resolve("ttyUSB7").toString();
        assertThatThrownBy(() -> SerialTransport.open(path, 500_000, DtrPolicy.RAISE, 200))
                .isInstanceOf(BadInputException.class)
                .hasMessage(path + ": no such port: is the probe plugged in? ('rcbench ports' lists ports)");
    }

    @Test
    void usbIdsAreToldFromPaths() {
        assertThat(SerialPorts.isUsbId("2341:0043")).isTrue();
        assertThat(SerialPorts.isUsbId("2e8a:000a:E6614C311B7A5E2C")).isTrue();
        assertThat(SerialPorts.isUsbId("/dev/ttyACM0")).isFalse();
        assertThat(SerialPorts.isUsbId("COM3")).isFalse();
    }

    @Test
    void anAbsentUsbIdIsOneLine() {
        assertThatThrownBy(() -> SerialPorts.opener("ffff:fffe", 500_000, DtrPolicy.RAISE, 200).open())
                .isInstanceOf(BadInputException.class)
                .hasMessage("ffff:fffe: no port with USB id ffff:fffe is plugged in ('rcbench ports' lists them)");
    }
}
