/**
 * Quantities with units and SI prefixes: parsing what users write, printing with engineering prefixes.
 * {@link dev.yoke.units.Units} reads text into SI doubles (°C for absolute temperatures) and writes
 * them back, either rounded for people or exactly for files; {@link dev.yoke.units.Dimension} lists
 * the kinds of quantity and the units accepted for each.
 */
package dev.yoke.units;
