/**
 * The {@code rcbench} command line (picocli): one small {@code Callable<Integer>} class per command,
 * exit statuses in {@link org.rcbench.cli.ExitCodes}, failures mapped to one line in
 * {@link org.rcbench.cli.Cli}. Depends on every stage; nothing depends on it.
 */
package org.rcbench.cli;
