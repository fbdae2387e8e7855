/** The entry point alone: parses nothing, computes nothing, exits. */
package dev.yoke.app;
