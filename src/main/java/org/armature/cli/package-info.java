/**
 * The headless command line {@code armature} (picocli): {@code new} writes a stage file from a
 * template with changed values; {@code solve} prints a stage's DC operating point as a table or as
 * one JSON object. {@link ArmatureCli} runs it and lists the subcommands in one place;
 * its Javadoc says how to add one.
 *
 * <p>Only this package writes to {@code System.out} and {@code System.err}, and only through
 * {@link ArmatureCli}; commands write through picocli's streams so that tests can capture them. No
 * class here loads JavaFX.
 */
package org.armature.cli;
