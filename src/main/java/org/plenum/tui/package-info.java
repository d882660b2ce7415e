/**
 * The meeting screen on Lanterna's Screen layer: views compose and display what {@code app}
 * returns; no SQL and no statistics here. One UI thread owns the screen and all view state;
 * other threads only post tasks to it.
 */
package org.plenum.tui;
