/**
 * The parts editor and the scenario editor of the workbench.
 *
 * <p>Both are built on one unit-aware form ({@link dev.yoke.tui.edit.FieldForm}) that checks
 * every field as the user types and names the problem next to the field; an invalid form is
 * never saved nor passed on. Files are written through the catalog package's atomic store; the
 * editors only decide what to write.
 */
package dev.yoke.tui.edit;
