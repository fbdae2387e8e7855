/**
 * The full-screen terminal workbench on Lanterna: the start-up view that shows the catalog and
 * scenario being read on a background thread ({@link dev.yoke.tui.StartupScreen}), the shortlist grid (a virtualized component that
 * draws only the visible rows), the pairing detail, help and cautions pages, the one-line prompts
 * (find, margin threshold, CSV export), background ranking and sorting, and the terminal set-up
 * (text terminal only, colour depth and character set from the environment). Keys live in
 * {@link dev.yoke.tui.KeyMap}; the parts and scenario editors plug in through
 * {@link dev.yoke.tui.EditorHooks} from {@code tui.edit}.
 */
package dev.yoke.tui;
