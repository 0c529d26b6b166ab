package org.flexmargin.campaign;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The per-sample results of a campaign on disk, streamed as samples finish and read back to
 * resume: {@code samples.partial.csv} and {@code margins.partial.csv} grow by one sample at a
 * time (margin lines first, then the sample line, each flushed), so a sample counts as done only
 * when its sample line is complete. {@code campaign.key} names the campaign the folder belongs
 * to; a folder of another campaign is refused. {@link #writeSorted} writes the final
 * {@code samples.csv} and {@code margins.csv} in task order, whatever the order of completion.
 */
public final class CampaignStore implements AutoCloseable {
  /** Streamed sample lines, in completion order. */
  public static final String PARTIAL_SAMPLES = "samples.partial.csv";
  /** Streamed margin lines, in completion order. */
  public static final String PARTIAL_MARGINS = "margins.partial.csv";
  /** The key of the campaign whose samples the folder holds. */
  public static final String KEY_FILE = "campaign.key";
  private final Path folder;
  private final SampleCsv csv;
  private final Map<Integer, SampleOutcome> done = new TreeMap<>();
  private BufferedWriter samples;
  private BufferedWriter margins;

  /**
   * Opens (or creates) the store of a campaign in {@code folder}, reading back the samples
   * already done.
   *
   * @param folder output folder (created if missing)
   * @param plan the campaign
   * @param key identity of the campaign (hash of its inputs)
   * @throws IllegalStateException if the folder holds samples of another campaign
   */
  public CampaignStore(Path folder, CampaignPlan plan, String key) {
    this.folder = folder;
    this.csv = new SampleCsv(plan);
    try {
      Files.createDirectories(folder);
      Path keyFile = folder.resolve(KEY_FILE);
      if (Files.exists(keyFile)) {
        String old = Files.readString(keyFile, StandardCharsets.UTF_8).strip();
        if (!old.equals(key)) {
          throw new IllegalStateException("the output folder " + folder + " holds samples of another campaign "
              + "(or of this campaign before its files changed); choose another --out folder");
        }
      } else {
        Files.writeString(keyFile, key + "\n", StandardCharsets.UTF_8);
      }
      load();
      samples = appender(folder.resolve(PARTIAL_SAMPLES));
      margins = appender(folder.resolve(PARTIAL_MARGINS));
    } catch (IOException e) {
      throw new UncheckedIOException("cannot use the output folder " + folder + ": " + e.getMessage(), e);
    }
  }

  private static BufferedWriter appender(Path p) throws IOException {
    return Files.newBufferedWriter(p, StandardCharsets.UTF_8, StandardOpenOption.CREATE, StandardOpenOption.APPEND);
  }

  /** Reads the complete lines back; cuts an incomplete last line left by an interruption. */
  private void load() throws IOException {
    List<String> sampleLines = completeLines(folder.resolve(PARTIAL_SAMPLES));
    List<String> marginLines = completeLines(folder.resolve(PARTIAL_MARGINS));
    Map<Integer, List<String>> byTask = new HashMap<>();
    for (String m : marginLines) {
      byTask.computeIfAbsent(SampleCsv.taskOf(m), k -> new ArrayList<>()).add(m);
    }
    for (String s : sampleLines) {
      int task = SampleCsv.taskOf(s);
      List<String> ms = byTask.getOrDefault(task, List.of());
      // a task interrupted and redone may have written its margin lines twice: keep the last run's
      int points = ms.isEmpty() ? 0 : (int) ms.stream().map(x -> x.split(",", 3)[1]).distinct().count();
      List<String> last = ms.subList(ms.size() - points, ms.size());
      done.put(task, csv.parse(s, last));
    }
  }

  private static List<String> completeLines(Path p) throws IOException {
    if (!Files.exists(p)) {
      return List.of();
    }
    String text = Files.readString(p, StandardCharsets.UTF_8);
    int end = text.lastIndexOf('\n');
    if (end + 1 != text.length()) {
      Files.writeString(p, text.substring(0, end + 1), StandardCharsets.UTF_8);
    }
    List<String> out = new ArrayList<>();
    for (String line : text.substring(0, end + 1).split("\n")) {
      if (!line.isEmpty()) {
        out.add(line);
      }
    }
    return out;
  }

  /** @return the folder of the store */
  public Path folder() {
    return folder;
  }

  /** @return the outcomes already done, by task */
  public synchronized Map<Integer, SampleOutcome> done() {
    return new TreeMap<>(done);
  }

  /** Appends one finished sample (thread-safe). */
  public synchronized void append(SampleOutcome o) {
    try {
      for (String m : SampleCsv.marginLines(o)) {
        margins.write(m);
        margins.write('\n');
      }
      margins.flush();
      samples.write(csv.sampleLine(o));
      samples.write('\n');
      samples.flush();
      done.put(o.task(), o);
    } catch (IOException e) {
      throw new UncheckedIOException("cannot append to " + folder.resolve(PARTIAL_SAMPLES) + ": " + e.getMessage(), e);
    }
  }

  /**
   * Writes {@code samples.csv} and {@code margins.csv} in task order (each through a temporary
   * file renamed into place).
   *
   * @param outcomes the outcomes, any order
   */
  public void writeSorted(List<SampleOutcome> outcomes) {
    writeSorted(folder, csv, outcomes);
  }

  /** Writes the sorted result files of {@code outcomes} into {@code folder}. */
  public static void writeSorted(Path folder, SampleCsv csv, List<SampleOutcome> outcomes) {
    List<SampleOutcome> sorted = new ArrayList<>(outcomes);
    sorted.sort(Comparator.comparingInt(SampleOutcome::task));
    StringBuilder s = new StringBuilder(csv.sampleHeader()).append('\n');
    StringBuilder m = new StringBuilder(SampleCsv.MARGIN_HEADER).append('\n');
    for (SampleOutcome o : sorted) {
      s.append(csv.sampleLine(o)).append('\n');
      for (String line : SampleCsv.marginLines(o)) {
        m.append(line).append('\n');
      }
    }
    replace(folder.resolve("samples.csv"), s.toString());
    replace(folder.resolve("margins.csv"), m.toString());
  }

  /** Writes {@code text} to a temporary sibling and renames it to {@code target}. */
  public static void replace(Path target, String text) {
    try {
      Path tmp = target.resolveSibling(".tmp-" + target.getFileName());
      Files.writeString(tmp, text, StandardCharsets.UTF_8);
      Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    } catch (IOException e) {
      throw new UncheckedIOException("cannot write " + target + ": " + e.getMessage(), e);
    }
  }

  @Override
  public synchronized void close() {
    try {
      samples.close();
      margins.close();
    } catch (IOException e) {
      throw new UncheckedIOException("cannot close the result files in " + folder, e);
    }
  }
}
