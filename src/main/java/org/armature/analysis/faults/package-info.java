/**
 * Fault hunt: single-fault models of a stage's parts ({@link org.armature.analysis.faults.FaultKind},
 * {@link org.armature.analysis.faults.FaultInjector}), the simulation-before-test fault dictionary
 * ({@link org.armature.analysis.faults.FaultDictionary}; check-values FH-1) and the ranking of
 * faults from meter readings with the next measurement by expected information gain
 * ({@link org.armature.analysis.faults.Diagnosis}; FH-2), with prior weights from published failure
 * rates and failure-mode shares ({@link org.armature.analysis.faults.PriorTable}; FH-5, as recalled
 * from memory) that users may change ({@link org.armature.analysis.faults.Priors}).
 */
package org.armature.analysis.faults;
