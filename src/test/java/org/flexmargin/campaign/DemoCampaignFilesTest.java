package org.flexmargin.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.flexmargin.io.CampaignReader;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.CampaignSpec;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.NotchFilterSpec;
import org.junit.jupiter.api.Test;

/**
 * The bundled demo campaign runs on the notched variant of the demo case, and that variant is the
 * demo case itself with only its loop filters, name and description changed.
 */
class DemoCampaignFilesTest {
  private static final Path DEMO = Path.of("mode-tables/demo");

  @Test
  void theDemoCampaignStartsFromTheNotchedCase() {
    CampaignSpec spec = CampaignReader.read(DEMO.resolve("demo-campaign.json"));
    assertEquals("demo-case-notched.json", spec.baseCaseFile());
    assertEquals(CaseReader.read(DEMO.resolve("demo-case-notched.json")).name(), spec.baseCase().name());
  }

  @Test
  void theNotchedCaseDiffersFromTheDemoCaseOnlyInItsFilters() throws IOException {
    ObjectMapper json = new ObjectMapper();
    JsonNode plain = json.readTree(DEMO.resolve("demo-case.json").toFile());
    JsonNode notched = json.readTree(DEMO.resolve("demo-case-notched.json").toFile());
    assertNotEquals(plain.get("name"), notched.get("name"), "its own report folder name");
    String text = notched.get("description").asText();
    assertTrue(text.startsWith("INVENTED") && text.contains("notch designer"), text);
    assertEquals(withoutFilters(plain), withoutFilters(notched));
  }

  @Test
  void bothPathsCarryTheSameNotchesAndThePitchPathKeepsItsLowPass() {
    AnalysisCase plain = CaseReader.read(DEMO.resolve("demo-case.json"));
    AnalysisCase notched = CaseReader.read(DEMO.resolve("demo-case-notched.json"));
    List<FeedbackPath> paths = notched.loop().paths();
    assertEquals(2, paths.size());
    List<FilterSpec> notches = notchesOf(paths.get(0));
    assertTrue(!notches.isEmpty());
    assertEquals(notches, notchesOf(paths.get(1)));
    assertEquals(otherFiltersOf(plain.loop().paths().get(0)), otherFiltersOf(paths.get(0)));
    assertEquals(otherFiltersOf(plain.loop().paths().get(1)), otherFiltersOf(paths.get(1)));
  }

  /** The case tree without name, description and the paths' filter lists. */
  private static JsonNode withoutFilters(JsonNode root) {
    ObjectNode copy = root.deepCopy();
    copy.remove(List.of("name", "description"));
    for (JsonNode path : copy.get("loop").get("paths")) {
      ((ObjectNode) path).remove("filters");
    }
    return copy;
  }

  private static List<FilterSpec> notchesOf(FeedbackPath path) {
    return path.filters().stream().filter(f -> f instanceof NotchFilterSpec).toList();
  }

  private static List<FilterSpec> otherFiltersOf(FeedbackPath path) {
    return path.filters().stream().filter(f -> !(f instanceof NotchFilterSpec)).toList();
  }
}
