/**
 * The Images pane: a virtualised grid of thumbnails (a list of rows of tiles, so only the visible rows exist as
 * nodes), thumbnails decoded lazily off the JavaFX thread into a bounded LRU cache, filters by root, folder and
 * findings (problems found in an image, shown as a strip on its tile), sorting, and similarity search.
 */
package org.morphscout.app.gui.library;
