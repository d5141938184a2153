/**
 * Rules for text the tool writes out of user-controlled values (file names, notes, columns passed through from a
 * user's file): {@link org.morphscout.indexer.text.CsvCells}, the one cell rule every CSV writer of the command line
 * and the browser applies. API: used by the {@code app} module.
 */
package org.morphscout.indexer.text;
