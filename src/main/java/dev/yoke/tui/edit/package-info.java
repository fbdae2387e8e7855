/**
 * The parts editor and the scenario editor of the workbench.
 *
 * <p>Both are built on one unit-aware form ({@link dev.yoke.tui.edit.FieldForm}) whose fields
 * come from the catalog package's field table, so a field is read exactly as the loader reads the
 * file: the problem is named beside the field at every key press ({@code !}), doubts from the
 * plausibility checks are marked {@code ?} without blocking, and an invalid form is never saved
 * nor passed on. Writes go through the catalog package's stores (atomic, with a backup, changed
 * files detected); the editors only decide what to write. {@link dev.yoke.tui.edit.WorkbenchEditors}
 * plugs them into the workbench's edit keys.
 */
package dev.yoke.tui.edit;
