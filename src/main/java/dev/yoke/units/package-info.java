/** Quantities with units and SI prefixes: parsing what users write, printing with engineering prefixes. */
package dev.yoke.units;
