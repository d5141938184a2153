package org.morphscout.app.gui.service;

/**
 * One result of a similarity search.
 *
 * @param id catalog image id
 * @param distance 1 - cosine similarity of the chosen vectors, in [0, 2]; smaller is more similar
 */
public record Match(long id, double distance) {}
