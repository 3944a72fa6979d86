/**
 * Stage files: the JSON form of {@link org.armature.model.StageDocument} ({@link StageJson}, schema
 * in {@code docs/stage-format.md}), bounded UTF-8 reading and saving ({@link StageFiles}), the one
 * safe write path for every file the program writes ({@link SafeWrite}: temporary file, sync, backup
 * {@code FILE~}, atomic move, folder sync), and autosave and recovery in a per-user folder
 * ({@link Autosave}).
 *
 * <p>Mapping is explicit, field by field; no type information is read from files. The document's
 * fault hunt (format version 4) is stored as entered, never with a ranking; its symptom and fault kind
 * words are checked against {@code analysis.faults} when read. Errors are one
 * plain sentence in a {@link StageFileException} with a stable key; values that are only out of
 * range are kept and left to {@link org.armature.model.Validator}.
 */
package org.armature.io;
