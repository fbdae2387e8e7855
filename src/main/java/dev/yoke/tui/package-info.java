/** The full-screen terminal workbench on Lanterna: one class per screen or dialog. */
package dev.yoke.tui;
