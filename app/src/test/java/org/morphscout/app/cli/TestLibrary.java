package org.morphscout.app.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.DemoImage;
import org.morphscout.demo.EncodedImage;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.NearDuplicateSet;
import org.morphscout.demo.TestFamilies;

/**
 * A small generated library on disk (invented demo pictures): a silhouette family (vase to bottle, PNG, in order of
 * t), unrelated distractors (JPEG), and a near-duplicate set (an original, five edited copies, three unrelated
 * pictures, written with their own bytes).
 */
final class TestLibrary {
  static final int FAMILY_SIZE = 8;
  static final int DISTRACTORS = 5;

  final long seed;
  final Path root;
  final List<Path> family = new ArrayList<>();
  final List<Double> familyT = new ArrayList<>();
  final List<Path> distractors = new ArrayList<>();
  final Path original;
  final List<Path> copies = new ArrayList<>();
  final List<Path> unrelated = new ArrayList<>();

  TestLibrary(Path root, long seed) throws IOException {
    this.seed = seed;
    this.root = root;
    List<FamilyItem> items = TestFamilies.silhouetteFamily(seed, FAMILY_SIZE, Archetype.VASE, Archetype.BOTTLE);
    for (int i = 0; i < items.size(); i++) {
      family.add(Cli.png(root.resolve("family/member-" + i + ".png"), items.get(i).image()));
      familyT.add(items.get(i).t());
    }
    List<DemoImage> others = TestFamilies.distractors(seed, DISTRACTORS);
    for (int i = 0; i < others.size(); i++) {
      distractors.add(Cli.jpeg(root.resolve("others/distractor-" + i + ".jpg"), others.get(i).image()));
    }
    NearDuplicateSet set = TestFamilies.nearDuplicates(seed);
    Path dupes = Files.createDirectories(root.resolve("dupes"));
    original = write(dupes, set.original());
    for (EncodedImage c : set.copies()) {
      copies.add(write(dupes, c));
    }
    for (EncodedImage u : set.unrelated()) {
      unrelated.add(write(dupes, u));
    }
  }

  private static Path write(Path dir, EncodedImage e) throws IOException {
    Path file = dir.resolve(e.label() + (e.format().equals("png") ? ".png" : ".jpg"));
    Files.write(file, e.bytes());
    return file;
  }

  /** Every picture written (all readable). */
  List<Path> all() {
    List<Path> out = new ArrayList<>(family);
    out.addAll(distractors);
    out.add(original);
    out.addAll(copies);
    out.addAll(unrelated);
    return out;
  }

  /** The original and its copies: every pair among them is a near-duplicate. */
  List<String> duplicateGroup() {
    List<String> out = new ArrayList<>();
    out.add(Cli.abs(original));
    copies.forEach(c -> out.add(Cli.abs(c)));
    return out;
  }
}
