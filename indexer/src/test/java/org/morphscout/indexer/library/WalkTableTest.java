package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WalkTableTest {
  @TempDir Path tmp;

  @Test
  void eachRowCarriesTheStepCostFromThePreviousImage() throws IOException {
    StringWriter out = new StringWriter();
    WalkTable.csv(out, List.of("/p/a.jpg", "/p/b.jpg", "/p/c.jpg"), List.of(0.02134, 0.00005));
    // RFC 4180: CRLF line ends; the first image has no previous one, so its cost is empty
    assertThat(out.toString()).isEqualTo("position,path,step_cost\r\n1,/p/a.jpg,\r\n2,/p/b.jpg,0.0213\r\n"
        + "3,/p/c.jpg,0.0001\r\n");
    assertThat(WalkTable.cost(1)).isEqualTo("1.0");
    assertThat(WalkTable.cost(Double.NaN)).isEmpty();
    assertThatThrownBy(() -> WalkTable.csv(new StringWriter(), List.of("/a", "/b"), List.of()))
        .isInstanceOf(IllegalArgumentException.class);
  }

  @Test
  void theFileIsNeverWrittenOverOneOfTheWalksImages() throws IOException {
    Path image = Files.writeString(tmp.resolve("a.jpg"), "not really a picture");
    List<String> paths = List.of(image.toString(), tmp.resolve("b.jpg").toString());
    assertThatThrownBy(() -> WalkTable.write(image, paths, List.of(0.5)))
        .hasMessageContaining("input");
    assertThat(Files.readString(image)).isEqualTo("not really a picture");
    Path csv = tmp.resolve("out/walk.csv");
    WalkTable.write(csv, paths, List.of(0.5));
    assertThat(Files.readAllLines(csv)).hasSize(3);
  }
}
