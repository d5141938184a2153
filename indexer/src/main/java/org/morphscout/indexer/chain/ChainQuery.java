package org.morphscout.indexer.chain;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * What {@link ChainFinder} is asked: a chain of real images from {@code from} to {@code to}.
 *
 * @param from first image id
 * @param to last image id (different from {@code from})
 * @param alternatives K, how many diverse chains to return, 1..20. Default 3.
 * @param minSteps least number of steps, &gt;= 1. Default 1 (the direct step is allowed).
 * @param maxSteps most steps, minSteps..64. Default 12: longer chains look like slideshows, not morphs.
 * @param costModel how step components are mixed into one cost; carries the shape weight. Default
 *     {@link StepCostModel#DEFAULT}.
 * @param avoid images the chain must not pass through (never {@code from}, {@code to} or a waypoint)
 * @param via ordered waypoints the chain must visit, distinct, not {@code from}/{@code to}; at most maxSteps - 1
 * @param maxOverlap diversity bound in [0, 1]: an alternative is accepted only if the Jaccard index of its
 *     intermediate images (waypoints excluded) with every earlier chain is at most this. Default 0.5.
 * @param penalty &gt; 1, factor by which the costs of steps touching an earlier chain's intermediates are
 *     multiplied before searching for the next alternative (penalty method). Default 2.
 */
public record ChainQuery(
    long from,
    long to,
    int alternatives,
    int minSteps,
    int maxSteps,
    StepCostModel costModel,
    Set<Long> avoid,
    List<Long> via,
    double maxOverlap,
    double penalty) {

  public static final int DEFAULT_ALTERNATIVES = 3;
  public static final int DEFAULT_MIN_STEPS = 1;
  public static final int DEFAULT_MAX_STEPS = 12;
  public static final double DEFAULT_MAX_OVERLAP = 0.5;
  public static final double DEFAULT_PENALTY = 2.0;
  /** Upper limit of maxSteps: keeps the layered search's state space (nodes x steps) bounded. */
  public static final int STEP_LIMIT = 64;

  public ChainQuery {
    if (from == to) {
      throw new IllegalArgumentException("a chain needs two different images, got " + from + " twice");
    }
    if (alternatives < 1 || alternatives > 20) {
      throw new IllegalArgumentException("alternatives must be in 1..20, got " + alternatives);
    }
    if (minSteps < 1 || maxSteps < minSteps || maxSteps > STEP_LIMIT) {
      throw new IllegalArgumentException(
          "steps must satisfy 1 <= min <= max <= " + STEP_LIMIT + ", got " + minSteps + ".." + maxSteps);
    }
    if (costModel == null) {
      throw new IllegalArgumentException("costModel must not be null");
    }
    avoid = Set.copyOf(avoid);
    via = List.copyOf(via);
    if (new HashSet<>(via).size() != via.size() || via.contains(from) || via.contains(to)) {
      throw new IllegalArgumentException("waypoints must be distinct and differ from both ends: " + via);
    }
    if (via.size() + 1 > maxSteps) {
      throw new IllegalArgumentException(
          via.size() + " waypoints need at least " + (via.size() + 1) + " steps, but maxSteps is " + maxSteps);
    }
    if (avoid.contains(from) || avoid.contains(to) || via.stream().anyMatch(avoid::contains)) {
      throw new IllegalArgumentException("the avoid set must not contain the ends or a waypoint");
    }
    if (!(maxOverlap >= 0 && maxOverlap <= 1)) {
      throw new IllegalArgumentException("maxOverlap must be in [0, 1], got " + maxOverlap);
    }
    if (!(penalty > 1 && Double.isFinite(penalty))) {
      throw new IllegalArgumentException("penalty must be > 1, got " + penalty);
    }
  }

  /** A query with every default. */
  public static ChainQuery between(long from, long to) {
    return new ChainQuery(from, to, DEFAULT_ALTERNATIVES, DEFAULT_MIN_STEPS, DEFAULT_MAX_STEPS,
        StepCostModel.DEFAULT, Set.of(), List.of(), DEFAULT_MAX_OVERLAP, DEFAULT_PENALTY);
  }

  public ChainQuery withAlternatives(int k) {
    return new ChainQuery(from, to, k, minSteps, maxSteps, costModel, avoid, via, maxOverlap, penalty);
  }

  public ChainQuery withSteps(int min, int max) {
    return new ChainQuery(from, to, alternatives, min, max, costModel, avoid, via, maxOverlap, penalty);
  }

  public ChainQuery withCostModel(StepCostModel model) {
    return new ChainQuery(from, to, alternatives, minSteps, maxSteps, model, avoid, via, maxOverlap, penalty);
  }

  public ChainQuery withShapeWeight(double w) {
    return withCostModel(costModel.shapeWeight(w));
  }

  public ChainQuery withAvoid(Set<Long> ids) {
    return new ChainQuery(from, to, alternatives, minSteps, maxSteps, costModel, ids, via, maxOverlap, penalty);
  }

  public ChainQuery withVia(List<Long> ids) {
    return new ChainQuery(from, to, alternatives, minSteps, maxSteps, costModel, avoid, ids, maxOverlap, penalty);
  }

  public ChainQuery withDiversity(double overlap, double factor) {
    return new ChainQuery(from, to, alternatives, minSteps, maxSteps, costModel, avoid, via, overlap, factor);
  }
}
