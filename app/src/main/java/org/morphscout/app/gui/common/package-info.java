/** View helpers shared by the panes: thumbnail tiles and their LRU cache, mask painting, drag and drop, messages. */
package org.morphscout.app.gui.common;
