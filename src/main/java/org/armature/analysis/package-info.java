/**
 * Judging a stage: the topology check, the sizing assistant, corner and Monte Carlo runs, and the
 * checks with their verdicts.
 *
 * <p>{@link org.armature.analysis.TopologyCheck} recognises which of the four driver stages was
 * drawn from connectivity alone and explains problems with stable finding keys. Everything here
 * returns findings or result records and never throws for bad user data; a value the checks cannot
 * judge is reported, not guessed.
 */
package org.armature.analysis;
