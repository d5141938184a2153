/**
 * Walkthroughs (API): orders a set of images into a smooth sequence, an open path or a closed tour, with a small
 * total of step distances and few large jumps. This is the travelling-salesman problem (open-path variant), solved
 * heuristically: nearest-neighbour construction (Rosenkrantz, Stearns and Lewis, SIAM J. Computing 1977), then
 * 2-opt (Croes, Operations Research 1958) and Or-opt (Or, Northwestern University 1976) local search on candidate
 * neighbour lists (Johnson and McGeoch, 1997). Checked against TSPLIB95 instances (Reinelt, ORSA J. Computing 1991).
 *
 * <p>Pick {@link org.morphscout.indexer.walk.WalkPlanner#planOpen} for a slideshow or morph sequence (optionally
 * with fixed first/last image) and {@link org.morphscout.indexer.walk.WalkPlanner#planClosed} for a loop.
 */
package org.morphscout.indexer.walk;
