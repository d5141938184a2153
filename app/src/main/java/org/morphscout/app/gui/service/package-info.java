/**
 * What the browser's view-models ask of the library, as small interfaces ({@code SimilarityBackend},
 * {@code PairsBackend}, {@code ChainsBackend}, {@code WalkBackend}, {@code PreviewBackend}, {@code IndexingBackend})
 * gathered in {@link org.morphscout.app.gui.service.Backends}, so that view-model tests can mix in recording fakes.
 *
 * <p>{@link org.morphscout.app.gui.service.LibraryBackends} serves every one of them from the library's own services,
 * the ones the command line calls: there is one implementation of each job.
 */
package org.morphscout.app.gui.service;
