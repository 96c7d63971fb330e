package org.rcbench.history;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;

/**
 * Where the history file lives when {@code --db} is not given: the user's data folder by each
 * platform's custom. Linux and other Unix: {@code $XDG_DATA_HOME/rcbench/history.db}, or
 * {@code ~/.local/share/rcbench/history.db} when that variable is unset or not absolute (XDG Base
 * Directory Specification 0.8). macOS: {@code ~/Library/Application Support/rcbench/history.db}
 * (Apple's File System Programming Guide). Windows: {@code %LOCALAPPDATA%\rcbench\history.db}, else
 * {@code %APPDATA%}, else {@code ~\AppData\Local}. Stateless.
 */
public final class DataFolder {
    /** The file name inside the data folder. */
    public static final String FILE_NAME = "history.db";

    private DataFolder() {
    }

    /** The default history file for this user on this machine. */
    public static Path defaultDatabase() {
        return defaultDatabase(System.getProperty("os.name", ""), System.getenv(),
                Path.of(System.getProperty("user.home")));
    }

    /** The default history file for {@code osName} (as in {@code os.name}), environment and home folder. */
    public static Path defaultDatabase(String osName, Map<String, String> env, Path home) {
        String os = osName.toLowerCase(Locale.ROOT);
        Path base;
        if (os.startsWith("windows")) {
            base = absolute(env.get("LOCALAPPDATA"));
            if (base == null) {
                base = absolute(env.get("APPDATA"));
            }
            if (base == null) {
                base = home.resolve("AppData").resolve("Local");
            }
        } else if (os.startsWith("mac") || os.startsWith("darwin")) {
            base = home.resolve("Library").resolve("Application Support");
        } else {
            base = absolute(env.get("XDG_DATA_HOME"));
            if (base == null) {
                base = home.resolve(".local").resolve("share");
            }
        }
        return base.resolve("rcbench").resolve(FILE_NAME);
    }

    private static Path absolute(String dir) {
        if (dir == null || dir.isBlank()) {
            return null;
        }
        Path p = Path.of(dir);
        return p.isAbsolute() ? p : null;
    }
}
