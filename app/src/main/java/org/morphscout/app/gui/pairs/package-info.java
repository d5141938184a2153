/**
 * The Pairs pane: suggested pairs in a sortable table (score, components, verdict, reasons), both silhouettes
 * overlaid after alignment, approve/reject/note stored in the catalog's decision store, and export of approved pairs
 * as CSV (RFC 4180) or JSON.
 */
package org.morphscout.app.gui.pairs;
