/**
 * Property-based tests (jqwik) that feed the readers of outside input with generated and mutated bytes: pair lists,
 * settings files, image files. Each property has a fixed seed (printed by jqwik on failure) and asserts that every
 * input ends in a result or a classified, user-facing reason, never an unexpected exception.
 */
package org.morphscout.indexer.hostile;
