/**
 * Stage files: the JSON form of {@link org.armature.model.StageDocument} ({@link StageJson}, schema
 * in {@code docs/stage-format.md}), atomic open and save ({@link StageFiles}), autosave and recovery
 * ({@link Autosave}).
 *
 * <p>Mapping is explicit, field by field; no type information is read from files. Errors are one
 * plain sentence in a {@link StageFileException} with a stable key; values that are only out of
 * range are kept and left to {@link org.armature.model.Validator}.
 */
package org.armature.io;
