/**
 * Chains of real images between two endpoints (API).
 *
 * <p>Images form a neighbour graph ({@link org.morphscout.indexer.chain.StepGraph}): each image is joined to its k
 * nearest images (k-NN graph, symmetrised), every step carrying its measured components (appearance distance,
 * shape incompatibility, colour gap) so that a query can mix them with its own
 * {@link org.morphscout.indexer.chain.StepCostModel} (shape weight). {@link
 * org.morphscout.indexer.chain.NeighbourGraphBuilder} keeps the k-NN lists up to date from a
 * {@link org.morphscout.indexer.chain.NeighbourSource} (the HNSW index of Malkov and Yashunin, "Efficient and robust
 * approximate nearest neighbor search using Hierarchical Navigable Small World graphs", IEEE TPAMI 2020, backs it
 * in the application).
 *
 * <p>{@link org.morphscout.indexer.chain.ChainFinder} minimises the sum of squared step costs, so a chain of many
 * small, even steps beats one with a few large jumps, within a minimum and maximum number of steps. The search is
 * Dijkstra's algorithm (Dijkstra, "A note on two problems in connexion with graphs", Numerische Mathematik 1959) on
 * a hop-layered state graph, which is exact for hop-bounded shortest walks (the same layering as the Bellman-Ford
 * recurrence bounded by the number of edges), sped up by an A* bound (Hart, Nilsson and Raphael, IEEE Trans. SSC
 * 1968) derived from plain shortest distances with the Cauchy-Schwarz inequality. Diverse alternatives come from the penalty method (Bader, Dees,
 * Geisberger and Sanders, TAPAS 2011); overlap is the Jaccard index of the intermediate images.
 *
 * <p>Pick: {@code minSteps} &gt; 1 to force in-between images even when a direct step exists; {@code via} to pass
 * through chosen images; {@code avoid} to leave images out; a lower {@code maxOverlap} for more different
 * alternatives (at the price of costlier ones).
 */
package org.morphscout.indexer.chain;
