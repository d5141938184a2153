package org.morphscout.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.app.gui.common.Pane;

class SettingsStoreTest {
  @TempDir Path tmp;

  @Test
  void roundTripsEverySetting() throws Exception {
    SettingsStore store = new SettingsStore(tmp.resolve("cfg/browser.json"));
    WindowSettings s = new WindowSettings("/data/cat", 12, 34, 1500, 900, true, Pane.PAIRS, 0.6);
    store.save(s);
    assertThat(store.load()).isEqualTo(s);
  }

  @Test
  void unplacedWindowSurvivesTheRoundTrip() throws Exception {
    SettingsStore store = new SettingsStore(tmp.resolve("browser.json"));
    store.save(WindowSettings.DEFAULTS);
    WindowSettings back = store.load();
    assertThat(back.x()).isNaN();
    assertThat(back.pane()).isEqualTo(Pane.LIBRARY);
  }

  @Test
  void missingOrDamagedFileGivesDefaults() throws Exception {
    Path f = tmp.resolve("browser.json");
    assertThat(new SettingsStore(f).load()).isEqualTo(WindowSettings.DEFAULTS);
    Files.writeString(f, "{ not json");
    assertThat(new SettingsStore(f).load()).isEqualTo(WindowSettings.DEFAULTS);
  }

  @Test
  void tooSmallWindowIsEnlargedAndBadDividerReset() {
    WindowSettings s = new WindowSettings(null, 0, 0, 10, 10, false, null, 5);
    assertThat(s.width()).isEqualTo(640);
    assertThat(s.height()).isEqualTo(420);
    assertThat(s.inspectorDivider()).isEqualTo(WindowSettings.DEFAULTS.inspectorDivider());
    assertThat(s.lastCatalog()).isEmpty();
  }

  @Test
  void configFolderFollowsEachSystemsConvention() {
    // XDG Base Directory Specification for Linux; %APPDATA% on Windows; ~/Library/Application Support on macOS
    Path home = Path.of("/home/ann");
    assertThat(SettingsStore.defaultFile(Map.of(), "Linux", home))
        .isEqualTo(Path.of("/home/ann/.config/morphscout/browser.json"));
    assertThat(SettingsStore.defaultFile(Map.of("XDG_CONFIG_HOME", "/cfg"), "Linux", home))
        .isEqualTo(Path.of("/cfg/morphscout/browser.json"));
    assertThat(SettingsStore.defaultFile(Map.of(), "Mac OS X", home))
        .isEqualTo(Path.of("/home/ann/Library/Application Support/Morphscout/browser.json"));
  }
}
