package org.morphscout.indexer.screen;

import org.morphscout.indexer.analysis.ImageAnalysis;

/**
 * Finds the analysis of an image by its path (a catalog lookup, or analysis on the fly). May throw: the screener
 * turns any failure into a FAIL row, using the exception's message as the reason, so messages should name the
 * problem for the user.
 */
@FunctionalInterface
public interface AnalysisResolver {
  ImageAnalysis resolve(String path) throws Exception;
}
