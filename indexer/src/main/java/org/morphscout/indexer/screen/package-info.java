/**
 * Screening of pairs chosen by the user (for example a list of planned morphs): each row (image A, image B, any
 * extra columns) gets a verdict, a score and plain-language reasons from {@link org.morphscout.indexer.pairing},
 * with the extra columns passed through. An image that cannot be read or analysed gives a FAIL row that says why;
 * screening never stops on one bad row. Reading and writing the table is the application's job. API; thread-safe.
 */
package org.morphscout.indexer.screen;
