package org.rcbench.history;

import java.sql.SQLException;
import java.util.Locale;
import org.rcbench.common.BadInputException;

/**
 * Turns SQLite failures into one line the user can act on. Busy or locked, not a database,
 * damaged, read-only, cannot open, disk full and I/O errors are the user's to fix
 * ({@link BadInputException} naming the file); anything else is a bug ({@link IllegalStateException}).
 * Result codes from the SQLite C interface documentation ("Result and Error Codes").
 */
final class SqlErrors {
    private static final int BUSY = 5;
    private static final int LOCKED = 6;
    private static final int READONLY = 8;
    private static final int IOERR = 10;
    private static final int CORRUPT = 11;
    private static final int FULL = 13;
    private static final int CANTOPEN = 14;
    private static final int NOTADB = 26;

    private SqlErrors() {
    }

    static RuntimeException translate(String file, SQLException e, int busyTimeoutMillis) {
        int primary = e.getErrorCode() & 0xff;
        String what = switch (primary) {
            case BUSY, LOCKED -> String.format(Locale.ROOT,
                    "the history is locked by another rcbench that is writing to it; gave up after %.1f s"
                            + " (try again when it has finished)", busyTimeoutMillis / 1000.0);
            case NOTADB -> "not a history database (the file is not SQLite)";
            case CORRUPT -> "the history database is damaged (SQLite reports corruption); restore a backup copy";
            case READONLY -> "the history database is read-only here (file or folder permissions)";
            case CANTOPEN -> "cannot open the history database (missing folder or no permission)";
            case FULL -> "the disk holding the history database is full";
            case IOERR -> "input/output error on the history database (" + firstLine(e) + ")";
            default -> null;
        };
        if (what == null) {
            return new IllegalStateException("history database " + file + ": " + firstLine(e), e);
        }
        return new BadInputException(file, what, e);
    }

    private static String firstLine(SQLException e) {
        String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        int nl = m.indexOf('\n');
        return nl < 0 ? m : m.substring(0, nl);
    }
}
