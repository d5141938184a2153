/** The Indexing pane: add a folder, watch progress, cancel, see failures with their reasons. */
package org.morphscout.app.gui.indexing;
