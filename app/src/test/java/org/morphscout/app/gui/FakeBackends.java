package org.morphscout.app.gui;

import java.util.ArrayList;
import java.util.List;
import org.morphscout.app.gui.service.Backends;
import org.morphscout.app.gui.service.ChainCandidate;
import org.morphscout.app.gui.service.ChainRequest;
import org.morphscout.app.gui.service.ChainStep;
import org.morphscout.app.gui.service.IndexSummary;
import org.morphscout.app.gui.service.LibraryBackends;
import org.morphscout.app.gui.service.WalkBackend;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.progress.CancellationToken;

/** Backends for view-model tests: the library's production services, with recording fakes mixed in. */
public final class FakeBackends {
  /** Every chain request the fake chains backend received. */
  public final List<ChainRequest> chainRequests = new ArrayList<>();
  public final List<String> indexed = new ArrayList<>();

  /** Production backends, except chains (records requests, returns a direct two-step chain) and indexing (fake). */
  public Backends.Factory factory() {
    return lib -> {
      Backends real = LibraryBackends.create(lib);
      return new Backends(real.similarity(), real.pairs(), (start, end, req, token) -> {
        chainRequests.add(req);
        return List.of(ChainCandidate.of(List.of(start, end),
            List.of(new ChainStep(start, end, 0.25, java.util.Map.of("appearanceDistance", 0.2, "shapeDistance", 0.3)))));
      }, real.walk(), real.preview(), (folder, progress, token) -> {
        progress.phase("analysing", 4);
        for (int i = 1; i <= 4; i++) {
          progress.progressed(i, "img" + i + ".png");
        }
        indexed.add(folder.toString());
        return new IndexSummary(4, 3, 1);
      }, real);
    };
  }

  /** A walk backend whose step between ids a and b is |a - b| / 100 and whose order is ascending id. */
  public static WalkBackend numericWalk() {
    return new WalkBackend() {
      @Override
      public List<Long> order(List<Long> ids, CancellationToken token) {
        return ids.stream().sorted().toList();
      }

      @Override
      public List<Double> steps(List<Long> ordered, CancellationToken token) {
        List<Double> s = new ArrayList<>();
        for (int i = 0; i + 1 < ordered.size(); i++) {
          s.add(Math.abs(ordered.get(i) - ordered.get(i + 1)) / 100.0);
        }
        return s;
      }
    };
  }

  public static Backends withWalk(Library lib, WalkBackend walk) {
    Backends real = LibraryBackends.create(lib);
    return new Backends(real.similarity(), real.pairs(), real.chains(), walk, real.preview(), real.indexing(), real);
  }
}
