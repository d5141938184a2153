/**
 * What the browser's view-models ask of the library, as small interfaces ({@code SimilarityBackend},
 * {@code PairsBackend}, {@code ChainsBackend}, {@code WalkBackend}, {@code PreviewBackend}, {@code IndexingBackend})
 * gathered in {@link org.morphscout.app.gui.service.Backends}, so that view-model tests run with fakes.
 *
 * <p>{@link org.morphscout.app.gui.service.InterimBackends} serves them from the catalog until the library's own
 * services are wired in: exact brute-force nearest neighbours over stored vectors, k shortest simple paths on a k-NN
 * graph (JGraphT), nearest-neighbour + 2-opt ordering (Croes 1958), mask alignment by centroid and area (the
 * translation/scale normalisation of moment invariants, Hu 1962), CIE76 colour difference, and a cross-dissolve.
 */
package org.morphscout.app.gui.service;
