/** Evaluating pairings against a scenario (detailed and fast paths) and ranking them. No I/O. */
package dev.yoke.engine;
