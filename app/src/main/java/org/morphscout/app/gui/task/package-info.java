/**
 * Background work for the browser: {@link org.morphscout.app.gui.task.TaskRunner} (submit work, get the result or the
 * error back on the UI thread), its JavaFX implementation with a named daemon pool, and a synchronous implementation
 * for view-model tests. Internal to the browser.
 */
package org.morphscout.app.gui.task;
