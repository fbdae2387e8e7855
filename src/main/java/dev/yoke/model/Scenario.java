package dev.yoke.model;

/** A machine to drive: the bench it runs on and the duty it must deliver. */
public record Scenario(String name, Bench bench, Profile profile) {
}
