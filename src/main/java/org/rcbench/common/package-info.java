/**
 * Small pieces shared by every stage: the exception that carries a user-fixable problem as one line.
 * Imports only {@code java.*}.
 */
package org.rcbench.common;
