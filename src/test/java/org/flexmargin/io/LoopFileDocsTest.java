package org.flexmargin.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.flexmargin.model.LoopFile;
import org.flexmargin.model.OpenLoopData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The annotated loop file of docs/loop-files.md and the general filters of docs/case-files.md follow the schemas and read. */
class LoopFileDocsTest {
  private static String jsonBlock(String doc, int index) throws Exception {
    Matcher m = Pattern.compile("```(?:jsonc|text)?\\n(.*?)```", Pattern.DOTALL).matcher(Files.readString(Path.of(doc)));
    for (int i = 0; i <= index; i++) {
      assertTrue(m.find(), doc + " has no block " + index);
    }
    return m.group(1).replaceAll("(?m)\\s*//.*$", "");
  }

  @Test
  void annotatedLoopFileConformsAndReads(@TempDir Path dir) throws Exception {
    String text = jsonBlock("docs/loop-files.md", 0);
    JsonNode n = new ObjectMapper().readTree(text);
    assertEquals(List.of(), Schemas.violations(Schemas.Kind.LOOP_FILE, n));
    Path f = dir.resolve("doc-loop.json");
    Files.writeString(f, text);
    LoopFile lf = LoopFileReader.read(f);
    assertTrue(lf.loop() instanceof OpenLoopData.ZerosPolesGain);
    assertEquals(3.8, lf.bandEdgeHz(), 0.0);
  }

  @Test
  void generalFilterExamplesConformToTheFiltersSchema() throws Exception {
    String doc = Files.readString(Path.of("docs/case-files.md"));
    Matcher m = Pattern.compile("```text\\n(\\{ \"lead_lag\".*?)```", Pattern.DOTALL).matcher(doc);
    assertTrue(m.find());
    JsonNode n = new ObjectMapper().readTree("{\"format\": 1, \"filters\": [" + m.group(1) + "]}");
    assertEquals(List.of(), Schemas.violations(Schemas.Kind.FILTERS, n));
    assertEquals(5, n.get("filters").size());
  }

  @Test
  void measuredTableReadsFromCsvAndJson(@TempDir Path dir) throws Exception {
    Path csv = Path.of("mode-tables/loops/ridgeline-ground-test.csv");
    assertEquals(190, MeasuredTableReader.read(csv).frequencyHz().length);
    Path json = dir.resolve("t.json");
    Files.writeString(json, "{\"format\": 1, \"frequency_hz\": [1, 2], \"gain_db\": [0, -1], \"phase_deg\": [-90, -95]}");
    assertEquals(2, MeasuredTableReader.read(json).gainDb().length);
    Files.writeString(json, "{\"format\": 1, \"frequency_hz\": [1, 2], \"gain_db\": [0], \"phase_deg\": [-90, -95]}");
    InputFileException e = org.junit.jupiter.api.Assertions.assertThrows(InputFileException.class,
        () -> MeasuredTableReader.read(json));
    assertTrue(e.getMessage().contains("t.json:1"), e.getMessage());
  }
}
