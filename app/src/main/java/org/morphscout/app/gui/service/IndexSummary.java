package org.morphscout.app.gui.service;

/** What one indexing run did: files found, now ready, and failed. */
public record IndexSummary(int found, int ready, int failed) {}
