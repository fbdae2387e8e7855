/**
 * Immutable records for parts (motors, switches), the bench and the duty profile.
 * SI units throughout; absolute temperatures in °C where the name ends in {@code Temp}.
 * No I/O and no behaviour beyond small derived quantities.
 */
package dev.yoke.model;
