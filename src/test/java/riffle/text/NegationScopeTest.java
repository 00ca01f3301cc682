package riffle.text;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import opennlp.tools.postag.POSModel;
import opennlp.tools.postag.POSTagFormat;
import opennlp.tools.postag.POSTaggerME;
import opennlp.tools.tokenize.TokenizerME;
import opennlp.tools.tokenize.TokenizerModel;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

class NegationScopeTest {

  private static TokenizerME tokenizer;
  private static POSTaggerME tagger;

  @BeforeAll
  static void loadModels() throws IOException {
    TokenizerModel tokenModel;
    try (InputStream in = open("/en-token.bin")) {
      tokenModel = new TokenizerModel(in);
    }
    POSModel posModel;
    try (InputStream in = open("/en-pos-maxent.bin")) {
      posModel = new POSModel(in);
    }
    tokenizer = new TokenizerME(tokenModel);
    tagger = new POSTaggerME(posModel, POSTagFormat.PENN);
  }

  private static InputStream open(String resource) {
    return Objects.requireNonNull(
        NegationScopeTest.class.getResourceAsStream(resource), resource + " on the classpath");
  }

  /**
   * The negated tokens of a hand-tagged sentence, written as {@code token/TAG} pairs, joined by
   * spaces.
   */
  private static String negated(String tagged) {
    String[] pairs = tagged.trim().split(" +");
    String[] tokens = new String[pairs.length];
    String[] tags = new String[pairs.length];
    for (int i = 0; i < pairs.length; i++) {
      int slash = pairs[i].lastIndexOf('/');
      tokens[i] = pairs[i].substring(0, slash);
      tags[i] = pairs[i].substring(slash + 1);
    }
    return join(tokens, NegationScope.mark(tokens, tags));
  }

  /** The negated tokens of a sentence run through the real tokenizer and tagger. */
  private static String negatedByPipeline(String sentence) {
    String[] tokens = tokenizer.tokenize(sentence);
    return join(tokens, NegationScope.mark(tokens, tagger.tag(tokens)));
  }

  private static String join(String[] tokens, boolean[] negated) {
    assertEquals(tokens.length, negated.length, "one flag per token");
    List<String> out = new ArrayList<>();
    for (int i = 0; i < tokens.length; i++) {
      if (negated[i]) {
        out.add(tokens[i]);
      }
    }
    return String.join(" ", out);
  }

  @Test
  void notGovernsTheRestOfTheClauseButNotItself() {
    assertEquals("arrive on time", negated("did/VBD NOT/NNP arrive/VB on/IN time/NN ./."));
    assertEquals("cheap", negated("not/RB cheap/JJ but/CC worth/JJ it/PRP"));
  }

  @Test
  void formsTypedWithoutTheApostropheAreCues() {
    assertEquals("sure it would fit", negated("wasnt/VBD sure/JJ it/PRP would/MD fit/VB"));
    assertEquals("heat up properly", negated("It/PRP wont/VBD heat/VB up/RP properly/RB"));
    assertEquals(
        "come with a tamper know why",
        negated("Didnt/JJ come/VBN with/IN a/DT tamper/NN ,/, dont/JJ know/VBP why/WRB"));
  }

  @Test
  void wontAsANounOrAdjectiveIsNoCue() {
    assertEquals(
        "", negated("As/IN is/VBZ his/PRP$ wont/NN ,/, the/DT courier/NN was/VBD late/RB"));
    assertEquals(
        "wont to complain",
        negated(
            "I/PRP 'm/VBP not/RB wont/JJ to/TO complain/VB but/CC the/DT box/NN was/VBD"
                + " crushed/VBN"));
  }

  @Test
  void splitMistypedAndTypographicApostrophesAreCues() {
    assertEquals("recommend it", negated("I/PRP ca/MD n't/RB recommend/VB it/PRP"));
    assertEquals("heat", negated("The/DT machine/NN does/VBZ n’t/RB heat/NN ,/, which/WDT is/VBZ"));
    assertEquals(
        "answer my emails", negated("They/PRP did/VBD n`/RB t/VB answer/NN my/PRP$ emails/NNS"));
    assertEquals("arrive", negated("did/VBD n;t/RB arrive/VB"));
    assertEquals("work at first", negated("Did/VBD 'nt/JJ work/NN at/IN first/JJ"));
    assertEquals("buy again", negated("Won't/NNP buy/VB again/RB"));
    assertEquals("recommend the kit", negated("I/PRP cannot/MD recommend/VB the/DT kit/NN"));
  }

  @Test
  void subordinateClausesStayInsideTheScope() {
    assertEquals(
        "know if it would fit under my cabinets",
        negated(
            "I/PRP did/VBD n't/RB know/VB if/IN it/PRP would/MD fit/VB under/IN my/PRP$"
                + " cabinets/NNS"));
  }

  @Test
  void noAsADeterminerNegatesUpToTheComma() {
    assertEquals(
        "delivery date shown",
        negated("no/DT delivery/NN date/NN shown/VBN ,/, so/RB I/PRP waited/VBD"));
    assertEquals("manual tamper", negated("No/DT manual/NN ,/, no/DT tamper/NN ./."));
  }

  @Test
  void noAsAnAnswerWordNegatesNothing() {
    assertEquals("", negated("No/UH ,/, it/PRP was/VBD fine/JJ"));
    assertEquals("", negated("No/UH it/PRP was/VBD fine/JJ"));
    assertEquals("", negated("No,/RB it/PRP was/VBD fine/JJ"));
    assertEquals("", negated("No/DT thanks/NNS"));
    assertEquals("", negated("No/UH that/DT 's/VBZ wrong/JJ"));
  }

  @Test
  void neverAgain() {
    assertEquals("again", negated("never/RB again/RB"));
  }

  @Test
  void withoutCoversOnlyTheNounPhraseAfterIt() {
    assertEquals(
        "a warranty have ordered",
        negated("without/IN a/DT warranty/NN I/PRP would/MD not/RB have/VB ordered/VBN"));
    assertEquals(
        "the tamper",
        negated("It/PRP came/VBD without/IN the/DT tamper/NN which/WDT was/VBD promised/VBN"));
    assertEquals(
        "it have bought", negated("without/IN it/PRP I/PRP would/MD not/RB have/VB bought/VBN"));
  }

  @Test
  void pronounCuesNegateWhatFollowsThem() {
    assertEquals("about delivery", negated("nothing/NN about/IN delivery/NN"));
    assertEquals(
        "of the parts were missing",
        negated("None/NN of/IN the/DT parts/NNS were/VBD missing/VBG"));
    assertEquals(
        "answered the phone",
        negated("nobody/NN answered/VBD the/DT phone/NN ;/: I/PRP gave/VBD up/RB"));
    assertEquals("", negated("Nothing/NN but/CC praise/NN for/IN the/DT team/NN"));
  }

  @Test
  void hardlyIsANegation() {
    assertEquals("convinced", negated("I/PRP was/VBD hardly/RB convinced/VBN"));
    assertEquals("ever used it", negated("I/PRP hardly/RB ever/RB used/VBD it/PRP"));
  }

  @Test
  void neitherAndNorBothOpenAScope() {
    assertEquals(
        "the box the manual mentioned the voltage",
        negated(
            "Neither/CC the/DT box/NN nor/CC the/DT manual/NN mentioned/VBD the/DT voltage/NN"));
  }

  @Test
  void andEndsTheScopeOnlyWhenANewClauseFollows() {
    assertEquals(
        "like the grinder",
        negated("I/PRP did/VBD not/RB like/IN the/DT grinder/NN and/CC I/PRP returned/VBD it/PRP"));
    assertEquals("arrive", negated("DIDNT/NNP arrive/VBP and/CC was/VBD scratched/VBN"));
    assertEquals(
        "arrive on time",
        negated("did/VBD not/RB arrive/VB on/IN time/NN and/CC the/DT box/NN was/VBD dented/VBN"));
    assertEquals(
        "get the grinder to work buy again",
        negated(
            "Couldnt/MD get/VB the/DT grinder/NN to/TO work/VB and/CC I/PRP wouldnt/MD buy/VB"
                + " again/RB"));
    assertEquals(
        "clean and descale it", negated("I/PRP did/VBD not/RB clean/VB and/CC descale/VB it/PRP"));
    assertEquals(
        "manual and descaler included",
        negated("There/EX was/VBD no/DT manual/NN and/CC no/DT descaler/NN included/VBN"));
    assertEquals(
        "recommend the kit",
        negated("I/PRP cannot/MD recommend/VB the/DT kit/NN and/CC then/RB it/PRP broke/VBD"));
  }

  @Test
  void contrastiveAndCausalConjunctionsEndTheScope() {
    assertEquals(
        "tried the frother yet",
        negated(
            "I/PRP havent/VBP tried/VBN the/DT frother/NN yet/RB though/IN it/PRP looks/VBZ"
                + " fine/JJ"));
    assertEquals(
        "buy again",
        negated("I/PRP would/MD n't/RB buy/VB again/RB because/IN the/DT pump/NN is/VBZ loud/JJ"));
    assertEquals(
        "buy again", negated("wont/VBD buy/VB again/RB unless/IN they/PRP fix/VBP it/PRP"));
  }

  @Test
  void yetAndSoEndTheScopeOnlyAsConjunctions() {
    assertEquals("yet arrived", negated("has/VBZ not/RB yet/RB arrived/VBN"));
    assertEquals("cheap", negated("not/RB cheap/JJ yet/RB worth/NN it/PRP"));
    assertEquals(
        "perfect", negated("it/PRP was/VBD n't/RB perfect/JJ yet/CC it/PRP did/VBD the/DT job/NN"));
    assertEquals(
        "get a refund yet",
        negated(
            "I/PRP didnt/VBP get/VB a/DT refund/NN yet/RB and/CC I/PRP am/VBP still/RB"
                + " waiting/VBG"));
    assertEquals("so good", negated("not/RB so/RB good/JJ ,/, honestly/RB"));
    assertEquals(
        "tighten it", negated("I/PRP did/VBD n't/RB tighten/VB it/PRP so/IN it/PRP leaks/VBZ"));
  }

  @Test
  void notOnlyAndNotJustAreAdditive() {
    assertEquals("", negated("It/PRP is/VBZ not/RB only/RB cheap/JJ but/CC also/RB reliable/JJ"));
    assertEquals(
        "", negated("the/DT grinder/NN is/VBZ n't/RB just/RB loud/JJ ,/, it/PRP also/RB jams/VBZ"));
  }

  @Test
  void dashesEndTheScopeButBracketsDoNot() {
    assertEquals(
        "the original one",
        negated(
            "The/DT portafilter/NN isnt/IN the/DT original/JJ one/CD —/: the/DT seller/NN"
                + " said/VBD nothing/NN"));
    assertEquals("work", negated("It/PRP didnt/VBD work/NN --/: had/VBD to/TO return/VB it/PRP"));
    assertEquals(
        "as promised free",
        negated("Shipping/NN was/VBD not/RB (/-LRB- as/IN promised/VBN )/-RRB- free/JJ"));
  }

  @Test
  void punctuationLeftOnAWordByTheTokenizerStillEndsTheScope() {
    assertEquals("terrible", negated("not/RB great...not/RB terrible/JJ"));
    assertEquals("fine.", negated("not/RB fine./JJ Loved/VBD it/PRP"));
    assertEquals("cheap", negated("not/RB cheap/JJ but,/CC worth/JJ it/PRP"));
  }

  @Test
  void doubleNegationIsNotResolved() {
    assertEquals("problems", negated("not/RB without/IN problems/NNS"));
  }

  @Test
  void missingTagsAreReadAsUnknown() {
    String[] tokens = {"did", "not", "arrive"};
    assertArrayEquals(
        new boolean[] {false, false, true},
        NegationScope.mark(tokens, new String[] {null, null, null}));
    assertArrayEquals(new boolean[0], NegationScope.mark(new String[0], new String[0]));
  }

  @Test
  void tokensAndTagsOfDifferentLengthsAreRefused() {
    IllegalArgumentException e =
        assertThrows(
            IllegalArgumentException.class,
            () -> NegationScope.mark(new String[] {"not", "cheap"}, new String[] {"RB"}));
    assertEquals("2 tokens but 1 tags; give one tag per token", e.getMessage());
  }

  @Test
  void buyerSentencesThroughTheRealTokenizerAndTagger() {
    assertEquals("arrive on time", negatedByPipeline("The grinder did NOT arrive on time."));
    assertEquals(
        "know if it would fit under my cabinets",
        negatedByPipeline("I didn't know if it would fit under my cabinets"));
    assertEquals("", negatedByPipeline("No, it was fine"));
    assertEquals("delivery date shown", negatedByPipeline("No delivery date shown, so I waited."));
    assertEquals(
        "a warranty have ordered",
        negatedByPipeline("Without a warranty I would not have ordered."));
    assertEquals("heat", negatedByPipeline("The machine doesn’t heat, which is annoying."));
    assertEquals(
        "get a tracking number",
        negatedByPipeline("i didnt get a tracking number and i had to call twice"));
    assertEquals("cheap", negatedByPipeline("Not cheap but worth it for a refurbished grinder."));
    assertEquals(
        "manual descaler included",
        negatedByPipeline("There was no manual and no descaler included."));
    assertEquals("", negatedByPipeline("It is not only cheap but also reliable."));
  }
}
