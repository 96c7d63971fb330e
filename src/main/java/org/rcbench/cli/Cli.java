package org.rcbench.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.NoSuchFileException;
import org.rcbench.common.BadInputException;
import picocli.CommandLine;

/**
 * Builds the {@code rcbench} command line and maps every failure to one line and an exit status.
 *
 * <p>{@link BadInputException} and picocli's parameter errors print their one-line message on
 * stderr and give {@link ExitCodes#BAD_INPUT}; anything else prints its class and message (never a
 * stack trace unless {@code RCBENCH_DEBUG} is set) and gives {@link ExitCodes#INTERNAL}.
 */
public final class Cli {
    private Cli() {
    }

    /** Runs {@code rcbench args} writing to the given streams; returns the exit status. */
    public static int run(String[] args, PrintStream out, PrintStream err) {
        PrintWriter outWriter = new PrintWriter(new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8), true);
        PrintWriter errWriter = new PrintWriter(new java.io.OutputStreamWriter(err, StandardCharsets.UTF_8), true);
        return commandLine(outWriter, errWriter).execute(args);
    }

    /** The configured command line, for tests and for embedding. */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new RcbenchCommand());
        cl.setOut(out);
        cl.setErr(err);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setExecutionExceptionHandler(Cli::handleExecutionException);
        cl.setParameterExceptionHandler(Cli::handleParameterException);
        return cl;
    }

    private static int handleParameterException(CommandLine.ParameterException ex, String[] args) {
        PrintWriter err = ex.getCommandLine().getErr();
        Throwable cause = ex.getCause();
        if (cause instanceof BadInputException bad) {
            err.println("rcbench: " + bad.getMessage());
        } else {
            err.println("rcbench: " + ex.getMessage());
            err.println("Try 'rcbench " + commandPath(ex.getCommandLine()) + "--help' for usage.");
        }
        err.flush();
        return ExitCodes.BAD_INPUT;
    }

    private static int handleExecutionException(Exception ex, CommandLine cl, CommandLine.ParseResult parsed) {
        PrintWriter err = cl.getErr();
        int code = exitCodeFor(ex);
        err.println("rcbench: " + messageFor(ex));
        if (System.getenv("RCBENCH_DEBUG") != null) {
            ex.printStackTrace(err);
        }
        err.flush();
        return code;
    }

    /** The exit status for an exception thrown by a command. */
    static int exitCodeFor(Throwable ex) {
        if (ex instanceof BadInputException) {
            return ExitCodes.BAD_INPUT;
        }
        if (ex instanceof UncheckedIOException u) {
            return exitCodeFor(u.getCause());
        }
        if (ex instanceof IOException) {
            // Files that cannot be read or written are the user's to fix.
            return ExitCodes.BAD_INPUT;
        }
        return ExitCodes.INTERNAL;
    }

    /** One line describing the failure. */
    static String messageFor(Throwable ex) {
        if (ex instanceof BadInputException) {
            return ex.getMessage();
        }
        if (ex instanceof UncheckedIOException u) {
            return messageFor(u.getCause());
        }
        if (ex instanceof NoSuchFileException nsf) {
            return nsf.getFile() + ": no such file";
        }
        if (ex instanceof IOException) {
            String m = ex.getMessage();
            return m == null ? ex.getClass().getSimpleName() : m.replace('\n', ' ');
        }
        return "internal error: " + ex.getClass().getName() + ": " + ex.getMessage()
                + " (set RCBENCH_DEBUG=1 for a stack trace)";
    }

    private static String commandPath(CommandLine cl) {
        StringBuilder sb = new StringBuilder();
        for (CommandLine c = cl; c != null && c.getParent() != null; c = c.getParent()) {
            sb.insert(0, c.getCommandName() + " ");
        }
        return sb.toString();
    }
}
