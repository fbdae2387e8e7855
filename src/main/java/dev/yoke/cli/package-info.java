/** One class per command; each parses its options and calls the core, returning an exit status. */
package dev.yoke.cli;
