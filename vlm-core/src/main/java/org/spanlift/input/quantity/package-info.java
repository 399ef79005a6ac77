/**
 * The typed quantity parser shared by the command line and the wing files: a number with a unit
 * suffix ({@code 6000N}, {@code 1350lb}, {@code 9800ft}, {@code 90kt}, {@code -10K}), read as a
 * given kind and converted to SI.
 */
package org.spanlift.input.quantity;
