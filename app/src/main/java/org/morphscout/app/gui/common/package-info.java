/**
 * What the panes share: the {@link org.morphscout.app.gui.common.Session} (open library, selection, chain endpoints,
 * current pane), failure messages, and view helpers (thumbnail tiles and their LRU cache, mask painting, drag and
 * drop, the message line). Below every pane package, so no pane depends on the window that assembles them.
 */
package org.morphscout.app.gui.common;
