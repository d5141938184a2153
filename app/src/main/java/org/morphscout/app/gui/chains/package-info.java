/**
 * The Chains pane: choose start and end (selection, drag and drop, or a file), set the options, see candidate chains
 * as filmstrips with each step's cost and its parts, the largest step and the unevenness; avoid or require images and
 * search again; play a preview of a chain.
 */
package org.morphscout.app.gui.chains;
