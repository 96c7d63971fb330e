package org.rcbench.gui;

import java.util.prefs.Preferences;

/** What the window remembers between runs. */
public interface BenchSettings {
    /** True once the user has read and closed the safety notice. */
    boolean safetyNoticeAccepted();

    void acceptSafetyNotice();

    /** Kept in the user's Java preferences (node {@code org/rcbench/gui}). */
    static BenchSettings userPreferences() {
        Preferences p = Preferences.userRoot().node("org/rcbench/gui");
        return new BenchSettings() {
            @Override
            public boolean safetyNoticeAccepted() {
                return p.getBoolean("safety-notice-accepted", false);
            }

            @Override
            public void acceptSafetyNotice() {
                p.putBoolean("safety-notice-accepted", true);
            }
        };
    }

    /** Kept in memory only (tests, snapshots). */
    static BenchSettings inMemory(boolean accepted) {
        return new BenchSettings() {
            private boolean ok = accepted;

            @Override
            public boolean safetyNoticeAccepted() {
                return ok;
            }

            @Override
            public void acceptSafetyNotice() {
                ok = true;
            }
        };
    }
}
