/**
 * The desktop browser (JavaFX), written MVVM: each pane has a {@code *View} that only builds widgets and binds them,
 * and a {@code *ViewModel} that holds the state, validates input and is the only caller of the library, through the
 * small interfaces of {@code gui.service}. Work runs behind {@link org.morphscout.app.gui.task.TaskRunner}, whose
 * callbacks land on the JavaFX thread, so analysis never runs on it. View-models import no {@code javafx.scene}
 * (only properties and collections), so they are tested without the toolkit.
 *
 * <p>{@link org.morphscout.app.gui.MorphscoutApp} starts the window; {@link org.morphscout.app.gui.MainView} holds
 * the panes (Images, Chains, Pairs, Walk, Indexing) beside the Inspector, each in its own package;
 * {@link org.morphscout.app.gui.common.Session} is the state they share (the panes depend on {@code gui.common},
 * {@code gui.service} and {@code gui.task}, never on this package, which assembles them); {@link org.morphscout.app.gui.SettingsStore}
 * remembers the last catalog and the layout in {@code browser.json} in the user's configuration folder;
 * {@link org.morphscout.app.gui.Shortcuts} lists the keyboard shortcuts (F1 shows them).
 */
package org.morphscout.app.gui;
