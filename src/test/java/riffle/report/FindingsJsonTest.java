package riffle.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.PropertyNamingStrategies;
import com.fasterxml.jackson.datatype.jdk8.Jdk8Module;
import org.junit.jupiter.api.Test;

/**
 * The keys of DESIGN.md section 4's {@code riffle report --json}, as the CLI's mapper names them.
 */
class FindingsJsonTest {

  @Test
  void findingsSerialiseWithTheDesignedKeys() {
    ObjectMapper mapper =
        new ObjectMapper()
            .registerModule(new Jdk8Module())
            .setPropertyNamingStrategy(PropertyNamingStrategies.SNAKE_CASE);
    JsonNode root =
        mapper.valueToTree(Report.compute(new Survey(3L).input(), ReportSettings.DEFAULTS));
    JsonNode q = root.get("questions").get(0);
    assertEquals(Survey.MAIN, q.get("question").asText());
    assertEquals(400, q.get("bases").get("Spring").asInt());
    JsonNode cost = q.get("codes").get(1);
    assertEquals("Delivery cost", cost.get("code").asText());
    assertEquals("Delivery", cost.get("parent").asText());
    assertTrue(q.get("codes").get(0).get("parent").isNull());
    JsonNode autumn = cost.get("waves").get("Autumn");
    for (String key : new String[] {"count", "base", "share", "ci", "small_base", "imprecise"}) {
      assertTrue(autumn.has(key), key);
    }
    assertTrue(autumn.get("ci").has("lower") && autumn.get("ci").has("upper"));
    JsonNode change = q.get("changes").get(0);
    for (String key :
        new String[] {"code", "from", "to", "diff", "ci", "p", "p_adjusted", "verdict"}) {
      assertTrue(change.has(key), key);
    }
    JsonNode pair = q.get("cooccurrence").get(0);
    for (String key : new String[] {"a", "b", "count", "jaccard", "lift", "p"}) {
      assertTrue(pair.has(key), key);
    }
    JsonNode saturation = q.get("saturation");
    for (String key : new String[] {"observed", "chao1", "ci", "curve", "new_in_window"}) {
      assertTrue(saturation.has(key), key);
    }
    assertTrue(saturation.get("curve").get(0).has("answers"));
  }
}
