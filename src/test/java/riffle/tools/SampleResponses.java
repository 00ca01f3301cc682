package riffle.tools;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.YearMonth;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.function.Predicate;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Seeded generator of the demo survey waves in {@code sample-responses/}.
 *
 * <p>The scenario is invented: Ondalune (ondalune.example), an online shop for refurbished espresso
 * machines and grinders, asks recent buyers two open questions after each order. Between wave 2 and
 * wave 3 the shop began to show a firm delivery date and its 12-month warranty at checkout, so the
 * two friction themes tied to that change fall in wave 3 while every other theme keeps the same
 * probability in all waves.
 *
 * <p>Everything here is a pure function of a seed: only {@link Random} with a fixed seed is used,
 * and collections are iterated in list order only, so regenerating reproduces the committed files
 * byte for byte. Each generated answer carries the themes planted in it ({@link
 * GeneratedAnswer#themes()}), the ground truth that tests of mining, coding suggestions and wave
 * changes can assert against.
 *
 * <p>Regenerate the committed files with {@code mvn -q test-compile exec:java
 * -Dexec.mainClass=riffle.tools.SampleResponses} (optional argument: the target folder).
 */
public final class SampleResponses {

  // ---------------------------------------------------------------------------------------------
  // Survey, waves and files
  // ---------------------------------------------------------------------------------------------

  /** The invented shop the demo waves come from. */
  public static final String SHOP = "Ondalune";

  /** The shop's invented web address (a reserved name). */
  public static final String SHOP_SITE = "ondalune.example";

  /** Open question one, about friction. */
  public static final String STOPPED_QUESTION = "What almost stopped you from ordering?";

  /** Open question two, about reasons to buy. */
  public static final String CHOSE_QUESTION = "What made you choose us?";

  /** Column holding the pilot's codes for {@link #STOPPED_QUESTION}. */
  public static final String STOPPED_CODES = "stopped codes";

  /** Column holding the pilot's codes for {@link #CHOSE_QUESTION}. */
  public static final String CHOSE_CODES = "chose codes";

  /** Column holding the pilot coder's initials. */
  public static final String CODED_BY = "coded_by";

  /** Columns of every wave export (and of {@link #writeLargeExport}), in file order. */
  public static final List<String> COLUMNS =
      List.of(
          "response_id",
          "submitted_at",
          "device",
          "customer",
          "order_value",
          STOPPED_QUESTION,
          CHOSE_QUESTION);

  /** Columns of the precoded pilot, in file order. */
  public static final List<String> PILOT_COLUMNS =
      List.of(
          "response_id",
          "submitted_at",
          "device",
          "customer",
          "order_value",
          STOPPED_QUESTION,
          STOPPED_CODES,
          CHOSE_QUESTION,
          CHOSE_CODES,
          CODED_BY);

  /**
   * Seed of the committed demo waves, picked among the first 400 after 20260901 so that sampling
   * noise keeps every flat theme within about three points across the waves (a demo should not show
   * spurious changes).
   */
  public static final long DEMO_SEED = 20_260_947L;

  /** Index of the pilot in {@link #demoWaves()} and in {@link Theme#probabilities()}. */
  public static final int PILOT = 0;

  /** Index of wave 1. */
  public static final int WAVE_1 = 1;

  /** Index of wave 2. */
  public static final int WAVE_2 = 2;

  /** Index of wave 3, the first wave after the checkout change. */
  public static final int WAVE_3 = 3;

  /** Wave names in import order. */
  public static final List<String> WAVE_NAMES = List.of("Pilot", "Wave 1", "Wave 2", "Wave 3");

  /** File names of the waves in import order. */
  public static final List<String> WAVE_FILES =
      List.of("precoded-pilot.tsv", "wave-1.csv", "wave-2.csv", "wave-3.csv");

  /** First fielding day of each wave in import order. */
  public static final List<LocalDate> WAVE_DATES =
      List.of(
          LocalDate.of(2025, 12, 1),
          LocalDate.of(2026, 3, 1),
          LocalDate.of(2026, 6, 1),
          LocalDate.of(2026, 9, 1));

  /** Respondents per wave in import order. */
  public static final List<Integer> WAVE_SIZES = List.of(1000, 520, 610, 580);

  /** Prefix of the response ids per wave in import order. */
  public static final List<String> WAVE_ID_PREFIXES = List.of("PL", "W1", "W2", "W3");

  /** Manifest listing the demo waves in import order. */
  public static final String MANIFEST = "demo-waves.csv";

  /** The folder's description, generated from the catalogue. */
  public static final String README = "README.md";

  /** Every file {@link #writeAll} writes. */
  public static final List<String> GENERATED_FILES =
      List.of("precoded-pilot.tsv", "wave-1.csv", "wave-2.csv", "wave-3.csv", MANIFEST, README);

  /** Languages other than English that some buyers answer in. */
  public static final List<String> LANGUAGES = List.of("de", "fr", "es", "nl", "it");

  /** Share of respondents who answer in a language other than English (when they name a theme). */
  public static final double FOREIGN_RATE = 0.028;

  /** Share of answers that are non-answers ("", "n/a", "-", "nothing", "no", "."). */
  public static final double NON_ANSWER_RATE = 0.05;

  /** Share of substantive answers that contain personal data. */
  public static final double PII_RATE = 0.03;

  /** The two open questions. */
  public enum Question {
    STOPPED(STOPPED_QUESTION, STOPPED_CODES),
    CHOSE(CHOSE_QUESTION, CHOSE_CODES);

    private final String text;
    private final String codesColumn;

    Question(String text, String codesColumn) {
      this.text = text;
      this.codesColumn = codesColumn;
    }

    /** The question as it appears in the export header. */
    public String text() {
      return text;
    }

    /** The pilot's codes column for this question. */
    public String codesColumn() {
      return codesColumn;
    }
  }

  /** Whether a theme is something buyers liked or something that held them back. */
  public enum Direction {
    PRAISE,
    FRICTION;

    /** Lower-case label, as written in the README. */
    public String label() {
      return name().toLowerCase(Locale.ROOT);
    }
  }

  /**
   * One planted theme.
   *
   * @param code stable code name (lower-case words), as used in the pilot's codes columns
   * @param parent parent theme
   * @param direction praise or friction
   * @param question the question it is an answer to
   * @param probabilities chance that a substantive answer carries it, per wave in import order
   * @param shortForms terse answers ("price", "delivery time??")
   * @param sentences sentence templates; {@code [a|b]} picks one alternative, {@code {machine}},
   *     {@code {machine2}}, {@code {grinder}}, {@code {budget}} and {@code {days}} fill in details
   * @param translations one sentence per language in {@link #LANGUAGES} order
   */
  public record Theme(
      String code,
      String parent,
      Direction direction,
      Question question,
      List<Double> probabilities,
      List<String> shortForms,
      List<String> sentences,
      List<String> translations) {

    /** Copies the lists and checks their sizes. */
    public Theme {
      probabilities = List.copyOf(probabilities);
      shortForms = List.copyOf(shortForms);
      sentences = List.copyOf(sentences);
      translations = List.copyOf(translations);
      if (probabilities.size() != WAVE_NAMES.size() || translations.size() != LANGUAGES.size()) {
        throw new IllegalArgumentException("theme " + code + ": wrong number of values");
      }
    }

    /** Planted probability in the wave with the given index ({@link #PILOT} .. {@link #WAVE_3}). */
    public double probability(int wave) {
      return probabilities.get(wave);
    }

    /** The theme's sentence in one of {@link #LANGUAGES}. */
    public String translation(String language) {
      return translations.get(LANGUAGES.indexOf(language));
    }

    /** Whether the planted probability differs between waves. */
    public boolean changes() {
      return probabilities.stream().distinct().count() > 1;
    }
  }

  private static List<Double> flat(double p) {
    return List.of(p, p, p, p);
  }

  /** Same probability up to wave 2, another from wave 3 on (after the checkout change). */
  private static List<Double> siteChange(double before, double after) {
    return List.of(before, before, before, after);
  }

  // ---------------------------------------------------------------------------------------------
  // Theme catalogue: friction (what almost stopped you from ordering?)
  // ---------------------------------------------------------------------------------------------

  /** No firm delivery date before wave 3. */
  public static final Theme DELIVERY_DATE_UNCLEAR =
      new Theme(
          "delivery date unclear",
          "delivery",
          Direction.FRICTION,
          Question.STOPPED,
          siteChange(0.18, 0.06),
          List.of(
              "delivery date",
              "delivery time??",
              "no delivery date",
              "when would it arrive?",
              "unclear delivery date",
              "delivery date not shown",
              "not knowing when it would be delivered",
              "delivery time"),
          List.of(
              "I did NOT know when it would arrive",
              "there was no delivery date shown anywhere",
              "no delivery date shown at checkout, just \"ships soon\"",
              "I couldn't see when it would be delivered",
              "[I didn't know|didn't know|I had no idea] when it would be delivered and I needed it"
                  + " before [my holiday|the weekend|my mum's birthday]",
              "the delivery date wasn't clear at all",
              "[wasn't|I wasn't] sure when it would be delivered",
              "it only said {days}-5 working days after dispatch, but not when dispatch would be",
              "I had no idea about the delivery date and I work shifts, so I need to plan to be"
                  + " home",
              "not knowing the delivery date, it was [meant to be|supposed to be] a present",
              "I wanted a [firm|proper|clear] delivery date before paying that much",
              "the delivery time was vague, \"soon\" isn't a date",
              "[couldn't|could not] find a delivery date for the {machine}"),
          List.of(
              "Ich wusste nicht, wann die Lieferung kommt.",
              "Je ne savais pas quand la machine serait livrée.",
              "No sabía cuándo llegaría el pedido.",
              "Ik wist niet wanneer het bezorgd zou worden.",
              "Non era chiaro quando sarebbe arrivata."));

  /** Doubts about the warranty and whether a refurbished machine will last; falls in wave 3. */
  public static final Theme WARRANTY_DOUBTS =
      new Theme(
          "warranty doubts",
          "trust",
          Direction.FRICTION,
          Question.STOPPED,
          siteChange(0.15, 0.05),
          List.of(
              "warranty?",
              "the warranty",
              "how long will it last",
              "warranty unclear",
              "no warranty info",
              "will it last?",
              "guarantee?"),
          List.of(
              "I wasn't sure what the warranty covered",
              "I didn't know if there was any warranty on a refurbished machine",
              "[worried|I was worried|scared] it would break after a few months and I'd be stuck"
                  + " with it",
              "[wasn't|I wasn't|not] sure a refurbished machine would last",
              "the warranty info was hard to find",
              "I couldn't find how long the warranty was",
              "whether a refurb would last more than a year",
              "not sure who I'd call if the pump died",
              "if it breaks after 6 months, what then?",
              "there was nothing about a guarantee on the product page",
              "I've had a used machine die on me before, so the warranty was a big question",
              "[would|will] a refurbished {machine} really last?"),
          List.of(
              "Ich war unsicher, ob es eine Garantie gibt und wie lange die Maschine hält.",
              "Je n'étais pas sûr de la garantie sur une machine reconditionnée.",
              "No estaba seguro de la garantía ni de cuánto duraría.",
              "Ik twijfelde of er garantie op zat en hoe lang hij mee zou gaan.",
              "Non ero sicuro della garanzia su una macchina ricondizionata."));

  /** Worries about the physical condition of a refurbished machine. */
  public static final Theme REFURBISHED_CONDITION =
      new Theme(
          "refurbished condition worries",
          "product",
          Direction.FRICTION,
          Question.STOPPED,
          flat(0.14),
          List.of(
              "condition of the machine",
              "scratches?",
              "is it really refurbished",
              "used = dirty?",
              "condition",
              "the condition"),
          List.of(
              "I was worried it would arrive scratched or dented",
              "the photos were stock photos, so I didn't know what condition mine would be in",
              "I wondered whether it had been descaled properly inside",
              "not sure what \"grade B\" actually means",
              "refurbished can mean anything, from like new to barely working",
              "I was afraid of getting someone else's old limescale",
              "[wasn't|I wasn't] sure if the steam wand and gaskets were replaced",
              "the word \"refurbished\" made me a bit nervous",
              "I worried it would look used on my kitchen counter",
              "hard to tell from the pictures how worn the {machine} would be"),
          List.of(
              "Ich hatte Angst, dass die Maschine zerkratzt oder verkalkt ankommt.",
              "J'avais peur qu'elle arrive rayée ou pleine de calcaire.",
              "Me preocupaba que llegara rayada o en mal estado.",
              "Ik was bang dat hij vol krassen of kalk zou zitten.",
              "Temevo che arrivasse graffiata o piena di calcare."));

  /** The price itself. */
  public static final Theme PRICE_TOO_HIGH =
      new Theme(
          "price too high",
          "cost",
          Direction.FRICTION,
          Question.STOPPED,
          flat(0.20),
          List.of("price", "the price", "PRICE", "cost", "still pricey", "price!!", "expensive"),
          List.of(
              "the price, it's still a lot of money even refurbished",
              "honestly it was more than I wanted to spend",
              "I thought refurbished would be cheaper than that",
              "the price was close to a new one on sale",
              "it was a lot [of money|] for a machine someone else already used",
              "the price difference to new [wasn't|was not] that big",
              "I had a budget of {budget} and the {machine} was over it",
              "it's expensive, I had to think about it for a week"),
          List.of(
              "Der Preis war mir eigentlich zu hoch.",
              "Le prix était un peu élevé pour moi.",
              "El precio me parecía alto.",
              "De prijs vond ik aan de hoge kant.",
              "Il prezzo era un po' alto."));

  /** Shipping charges. */
  public static final Theme SHIPPING_COST =
      new Theme(
          "shipping cost",
          "cost",
          Direction.FRICTION,
          Question.STOPPED,
          flat(0.11),
          List.of("shipping cost", "shipping costs", "delivery charge", "postage", "shipping fee"),
          List.of(
              "the shipping cost only showed up at the very end",
              "paying for shipping on top of that felt a bit much",
              "shipping was expensive for a grinder",
              "I didn't expect a delivery charge that high",
              "no free shipping, which most shops have these days",
              "the postage added almost 10% to the order"),
          List.of(
              "Die Versandkosten waren ziemlich hoch.",
              "Les frais de livraison étaient élevés.",
              "Los gastos de envío eran caros.",
              "De verzendkosten waren hoog.",
              "Le spese di spedizione erano alte."));

  /** How to pay. */
  public static final Theme PAYMENT_OPTIONS =
      new Theme(
          "payment options",
          "cost",
          Direction.FRICTION,
          Question.STOPPED,
          flat(0.07),
          List.of(
              "payment options",
              "no instalments",
              "payment options?",
              "pay in instalments?",
              "no pay later option",
              "only card"),
          List.of(
              "I wanted to pay in instalments and couldn't find how",
              "[no|there was no] option to pay in instalments",
              "[not many|too few|very few] payment options",
              "the payment options were [limited|a bit limited], only card",
              "only card payment, I prefer bank transfer",
              "no option to pay later",
              "my card got declined twice at checkout",
              "I couldn't pay with my phone wallet",
              "the payment page looked different from the rest of the site, which felt odd"),
          List.of(
              "Ich hätte gern in Raten bezahlt.",
              "Je voulais payer en plusieurs fois.",
              "Quería pagar a plazos.",
              "Ik wilde achteraf betalen, maar dat kon niet.",
              "Avrei voluto pagare a rate."));

  /** Whether the machine fits the kitchen. */
  public static final Theme MACHINE_SIZE =
      new Theme(
          "machine size and fit",
          "product",
          Direction.FRICTION,
          Question.STOPPED,
          flat(0.09),
          List.of("size", "would it fit?", "dimensions", "the height", "counter space"),
          List.of(
              "[wasnt|wasn't|I wasn't] sure it would fit under my cabinets",
              "didn't know if it would fit",
              "the dimensions weren't listed, or I couldn't find them",
              "my kitchen is tiny and I had to measure twice",
              "I wasn't sure the {machine} would fit next to the toaster",
              "worried it would be too tall with the bean hopper on",
              "I needed to know the depth, my counter is only 50 cm"),
          List.of(
              "Ich wusste nicht, ob sie unter meine Hängeschränke passt.",
              "Je ne savais pas si elle rentrerait sous mes placards.",
              "No sabía si cabría debajo de los armarios.",
              "Ik wist niet of hij onder de kastjes zou passen.",
              "Non sapevo se ci stava sotto i pensili."));

  /** Not knowing the shop. Returning customers mention it far less. */
  public static final Theme UNKNOWN_SHOP =
      new Theme(
          "unknown shop",
          "trust",
          Direction.FRICTION,
          Question.STOPPED,
          flat(0.12),
          List.of("never heard of you", "trust", "new shop?", "is this legit", "unknown shop"),
          List.of(
              "I had never heard of Ondalune before",
              "I wasn't sure you were a real shop",
              "I didn't know the shop and there weren't many reviews",
              "you were a new name to me, so I looked you up first",
              "it's a lot of money to send to a shop I didn't know",
              "honestly I [wasnt|wasn't] sure if the site was legit",
              "I couldn't find an address or phone number on the site at first"),
          List.of(
              "Ich kannte den Shop vorher nicht.",
              "Je ne connaissais pas la boutique.",
              "No conocía la tienda.",
              "Ik kende de winkel niet.",
              "Non conoscevo il negozio."));

  /** Returns and the right to send back. */
  public static final Theme RETURN_POLICY =
      new Theme(
          "return policy unclear",
          "trust",
          Direction.FRICTION,
          Question.STOPPED,
          flat(0.08),
          List.of("returns", "return policy", "can I send it back?", "returns?"),
          List.of(
              "I couldn't find out if I could return it",
              "not sure how returns work for a heavy machine",
              "the return policy was hard to find",
              "would I have to pay to send it back?",
              "didn't know if I had 14 or 30 days to return it",
              "what if I don't like it, the returns page [didnt|didn't] say"),
          List.of(
              "Mir war nicht klar, ob ich sie zurückschicken kann.",
              "Je ne savais pas si je pouvais la retourner.",
              "No estaba claro si podía devolverla.",
              "Het was niet duidelijk of ik hem kon terugsturen.",
              "Non era chiaro se potevo restituirla."));

  // ---------------------------------------------------------------------------------------------
  // Theme catalogue: praise (what made you choose us?)
  // ---------------------------------------------------------------------------------------------

  /** Price and value for money. */
  public static final Theme PRICE_AND_VALUE =
      new Theme(
          "price and value",
          "value",
          Direction.PRAISE,
          Question.CHOSE,
          flat(0.32),
          List.of(
              "price",
              "good value",
              "the price",
              "value for money",
              "cheaper than new",
              "great price",
              "worth the money"),
          List.of(
              "good value for a machine of this level",
              "it was worth the money",
              "great price for the quality",
              "half the price of a new one",
              "cheapest I found for the {machine}",
              "good value, I got a dual boiler for the price of an entry level machine",
              "I could afford a much better machine than buying new",
              "the price was right",
              "[really|very] good value compared to new",
              "it's worth the money, no question",
              "great price for the quality of the {machine}"),
          List.of(
              "Gutes Preis-Leistungs-Verhältnis.",
              "Un très bon rapport qualité-prix.",
              "Muy buena relación calidad-precio.",
              "Goede prijs voor de kwaliteit.",
              "Ottimo rapporto qualità-prezzo."));

  /** The warranty as a reason to buy. */
  public static final Theme WARRANTY_INCLUDED =
      new Theme(
          "warranty included",
          "confidence",
          Direction.PRAISE,
          Question.CHOSE,
          flat(0.15),
          List.of("warranty", "the warranty", "12 month warranty", "guarantee", "warranty!"),
          List.of(
              "the 12-month warranty",
              "you give a full year of warranty, which others don't",
              "having a warranty on a refurbished machine",
              "the warranty made it feel safe",
              "warranty included, no extra charge",
              "knowing I'm covered if something breaks",
              "once I found the warranty page it was reassuring"),
          List.of(
              "Die Garantie von 12 Monaten.",
              "La garantie de 12 mois.",
              "La garantía de 12 meses.",
              "De garantie van een jaar.",
              "La garanzia di 12 mesi."));

  /** The testing and certification of each refurbished machine. */
  public static final Theme TESTED_AND_CERTIFIED =
      new Theme(
          "tested and certified",
          "confidence",
          Direction.PRAISE,
          Question.CHOSE,
          flat(0.21),
          List.of("tested", "the testing", "certified refurb", "quality check", "test report"),
          List.of(
              "every machine is tested before it ships",
              "you explain exactly what gets replaced and tested",
              "the test report with the pressure and temperature readings",
              "the checklist of what was replaced (gaskets, shower screen, pump)",
              "it was properly refurbished, not just cleaned",
              "I liked that a technician signs off on each machine",
              "the refurbishment process is explained [on the site|step by step]",
              "certified refurbished, not just second hand"),
          List.of(
              "Jede Maschine wird geprüft, das hat mich überzeugt.",
              "Chaque machine est testée avant l'envoi.",
              "Cada máquina se revisa antes del envío.",
              "Elke machine wordt getest voor verzending.",
              "Ogni macchina viene testata prima della spedizione."));

  /** Advice and customer service. Returning customers mention it more. */
  public static final Theme HELPFUL_ADVICE =
      new Theme(
          "helpful advice",
          "service",
          Direction.PRAISE,
          Question.CHOSE,
          flat(0.14),
          List.of(
              "customer service", "the advice", "helpful staff", "great support", "quick answers"),
          List.of(
              "I [emailed|sent] a question and got a real answer the same day",
              "the chat helped me pick between two grinders",
              "someone called me back and explained the difference between the machines",
              "customer service was [super|really|very] helpful",
              "you answered my question about water hardness quickly",
              "the advice on which grinder goes with the {machine}",
              "helpful and friendly, not pushy at all"),
          List.of(
              "Der Kundenservice hat mich super beraten.",
              "Le service client m'a très bien conseillé.",
              "El servicio al cliente me ayudó mucho.",
              "De klantenservice gaf goed advies.",
              "Il servizio clienti mi ha consigliato benissimo."));

  /** Delivery speed. */
  public static final Theme FAST_DELIVERY =
      new Theme(
          "fast delivery",
          "service",
          Direction.PRAISE,
          Question.CHOSE,
          flat(0.12),
          List.of("fast delivery", "quick shipping", "delivery speed", "fast shipping"),
          List.of(
              "it arrived in {days} days",
              "fast delivery, ordered on Monday and had it on Wednesday",
              "quick shipping and well packed",
              "it was delivered faster than I expected",
              "next day delivery"),
          List.of(
              "Schnelle Lieferung.",
              "Livraison rapide.",
              "Entrega rápida.",
              "Snelle levering.",
              "Consegna veloce."));

  /** Reuse and less waste. */
  public static final Theme LESS_WASTE =
      new Theme(
          "less waste",
          "values",
          Direction.PRAISE,
          Question.CHOSE,
          flat(0.12),
          List.of("sustainability", "less waste", "reuse", "better for the planet", "eco"),
          List.of(
              "I like giving a good machine a second life",
              "less waste than buying new",
              "it feels better than buying something new that uses more resources",
              "sustainability matters to me",
              "no point making a new machine when good ones get thrown away",
              "the packaging was recycled too"),
          List.of(
              "Weniger Müll als bei einer neuen Maschine.",
              "Moins de gaspillage qu'une machine neuve.",
              "Menos residuos que comprar una nueva.",
              "Minder afval dan nieuw kopen.",
              "Meno sprechi che comprarne una nuova."));

  /** Reviews and word of mouth. Returning customers mention it less. */
  public static final Theme GOOD_REVIEWS =
      new Theme(
          "good reviews",
          "confidence",
          Direction.PRAISE,
          Question.CHOSE,
          flat(0.15),
          List.of(
              "reviews",
              "recommendation",
              "a friend recommended you",
              "good reviews",
              "word of mouth"),
          List.of(
              "a friend bought one from you and recommended you",
              "the reviews were really positive",
              "I read a lot of good reviews",
              "my brother in law swore by you",
              "someone on a coffee forum recommended you",
              "[good|great] reviews, hardly any complaints"),
          List.of(
              "Ein Freund hat euch empfohlen.",
              "Un ami m'a recommandé votre boutique.",
              "Un amigo me recomendó la tienda.",
              "Een vriend raadde jullie aan.",
              "Un amico mi ha consigliato il negozio."));

  /** The range of machines and grinders. */
  public static final Theme WIDE_CHOICE =
      new Theme(
          "wide choice",
          "value",
          Direction.PRAISE,
          Question.CHOSE,
          flat(0.10),
          List.of("choice", "selection", "range of machines", "lots of models"),
          List.of(
              "you had the exact model I wanted",
              "good choice of machines and grinders",
              "the range of grinders, nobody else had the {grinder} refurbished",
              "I could get the machine and a matching grinder in one order",
              "lots of models to compare in one place",
              "big selection, and you can filter by what you need"),
          List.of(
              "Große Auswahl an Maschinen und Mühlen.",
              "Un grand choix de machines et de moulins.",
              "Mucha variedad de cafeteras y molinos.",
              "Grote keuze aan machines en molens.",
              "Ampia scelta di macchine e macinini."));

  /** Every planted theme: the friction themes, then the praise themes (the drawing order). */
  public static final List<Theme> THEMES =
      List.of(
          DELIVERY_DATE_UNCLEAR,
          WARRANTY_DOUBTS,
          REFURBISHED_CONDITION,
          PRICE_TOO_HIGH,
          SHIPPING_COST,
          PAYMENT_OPTIONS,
          MACHINE_SIZE,
          UNKNOWN_SHOP,
          RETURN_POLICY,
          PRICE_AND_VALUE,
          WARRANTY_INCLUDED,
          TESTED_AND_CERTIFIED,
          HELPFUL_ADVICE,
          FAST_DELIVERY,
          LESS_WASTE,
          GOOD_REVIEWS,
          WIDE_CHOICE);

  /** The themes that fall in wave 3 because of the checkout change. */
  public static final List<Theme> SITE_CHANGE_THEMES =
      List.of(DELIVERY_DATE_UNCLEAR, WARRANTY_DOUBTS);

  /** The themes of one question, in catalogue order. */
  public static List<Theme> themes(Question question) {
    return THEMES.stream().filter(t -> t.question() == question).toList();
  }

  /** The theme with the given code name. */
  public static Theme theme(String code) {
    for (Theme t : THEMES) {
      if (t.code().equals(code)) {
        return t;
      }
    }
    throw new IllegalArgumentException("no theme " + code);
  }

  // ---------------------------------------------------------------------------------------------
  // Metadata and how themes depend on each other
  // ---------------------------------------------------------------------------------------------

  /**
   * A metadata column with its categories and their weights (the same in every wave).
   *
   * @param name column name in the export
   * @param values categories
   * @param weights chance of each category
   */
  public record Column(String name, List<String> values, List<Double> weights) {
    /** Copies the lists. */
    public Column {
      values = List.copyOf(values);
      weights = List.copyOf(weights);
    }

    /** Chance of one category. */
    public double weight(String value) {
      return weights.get(values.indexOf(value));
    }

    String draw(Random r) {
      double u = r.nextDouble();
      for (int i = 0; i < values.size() - 1; i++) {
        u -= weights.get(i);
        if (u < 0) {
          return values.get(i);
        }
      }
      return values.get(values.size() - 1);
    }
  }

  /** Device the survey was answered on. */
  public static final Column DEVICE =
      new Column("device", List.of("mobile", "desktop", "tablet"), List.of(0.58, 0.34, 0.08));

  /** New or returning customer. */
  public static final Column CUSTOMER =
      new Column("customer", List.of("new", "returning"), List.of(0.71, 0.29));

  /** Order value band (currency-neutral). */
  public static final Column ORDER_VALUE =
      new Column(
          "order_value",
          List.of("under 200", "200-499", "500 and over"),
          List.of(0.32, 0.43, 0.25));

  /**
   * A theme that travels with another: when the anchor is named (in the same answer, or for a
   * cross-question link in the other answer) and the theme is not, the theme is added with chance
   * {@code added}. Slot weights are solved so that the planted probability stays exact.
   */
  public record Link(Theme theme, Theme anchor, double added) {}

  /** Themes that travel together (the anchor comes first in {@link #THEMES}). */
  public static final List<Link> LINKS =
      List.of(
          new Link(REFURBISHED_CONDITION, WARRANTY_DOUBTS, 0.45),
          new Link(SHIPPING_COST, PRICE_TOO_HIGH, 0.30),
          new Link(RETURN_POLICY, UNKNOWN_SHOP, 0.30),
          new Link(WARRANTY_INCLUDED, WARRANTY_DOUBTS, 0.35),
          new Link(TESTED_AND_CERTIFIED, WARRANTY_INCLUDED, 0.45),
          new Link(FAST_DELIVERY, HELPFUL_ADVICE, 0.30),
          new Link(LESS_WASTE, PRICE_AND_VALUE, 0.22));

  /**
   * A theme that is {@code factor} times as likely for one metadata category; the other categories
   * share the rest so that the planted probability stays exact.
   */
  public record Lean(Theme theme, Column column, String value, double factor) {}

  /** Small, plausible ties between metadata and themes. */
  public static final List<Lean> LEANS =
      List.of(
          new Lean(UNKNOWN_SHOP, CUSTOMER, "returning", 0.25),
          new Lean(GOOD_REVIEWS, CUSTOMER, "returning", 0.40),
          new Lean(HELPFUL_ADVICE, CUSTOMER, "returning", 1.60),
          new Lean(PRICE_TOO_HIGH, ORDER_VALUE, "500 and over", 1.50),
          new Lean(PRICE_AND_VALUE, ORDER_VALUE, "500 and over", 1.25),
          new Lean(PAYMENT_OPTIONS, DEVICE, "mobile", 1.35));

  /**
   * How many things a buyer names in one answer ("slots"): one, two or three. Each slot picks a
   * theme of the question by its weight, or something off the catalogue; planted themes are the
   * distinct picks plus {@link #LINKS}. Unlike independent coin flips per theme, this keeps answers
   * with no planted theme rare while every theme keeps its exact planted probability.
   */
  public static final List<Double> SLOT_CHANCES = List.of(0.65, 0.27, 0.08);

  private static Link linkOf(Theme theme) {
    for (Link link : LINKS) {
      if (link.theme() == theme) {
        return link;
      }
    }
    return null;
  }

  /** Planted probability of a theme for one metadata combination (after {@link #LEANS}). */
  static double target(Theme theme, int wave, Meta meta) {
    double p = theme.probability(wave);
    for (Lean lean : LEANS) {
      if (lean.theme() == theme) {
        double f = lean.column().weight(lean.value());
        return meta.value(lean.column()).equals(lean.value())
            ? p * lean.factor()
            : p * (1 - f * lean.factor()) / (1 - f);
      }
    }
    return p;
  }

  /** Chance that no slot picks an option of weight {@code w}. */
  private static double none(double w) {
    double q = 1 - w;
    return SLOT_CHANCES.get(0) * q + SLOT_CHANCES.get(1) * q * q + SLOT_CHANCES.get(2) * q * q * q;
  }

  /**
   * Slot weights per theme (index as in {@link #THEMES}) for one wave and metadata combination,
   * solved so that each theme appears with exactly its {@link #target} probability.
   */
  static double[] slotWeights(int wave, Meta meta) {
    double[] w = new double[THEMES.size()];
    for (int i = 0; i < THEMES.size(); i++) {
      Theme theme = THEMES.get(i);
      double goal = target(theme, wave, meta);
      Link link = linkOf(theme);
      double lo = 0;
      double hi = 1;
      int anchor = link == null ? -1 : THEMES.indexOf(link.anchor());
      if (link != null && link.anchor().question() == theme.question()) {
        hi = 1 - w[anchor];
      }
      for (int step = 0; step < 60; step++) {
        double mid = (lo + hi) / 2;
        double p;
        if (link == null) {
          p = 1 - none(mid);
        } else if (link.anchor().question() != theme.question()) {
          p = 1 - none(mid) + link.added() * target(link.anchor(), wave, meta) * none(mid);
        } else {
          Link outer = linkOf(link.anchor());
          double external = outer == null ? 0 : outer.added() * target(outer.anchor(), wave, meta);
          p = 1 - none(mid) + link.added() * (none(mid) - none(w[anchor] + mid) * (1 - external));
        }
        if (p < goal) {
          lo = mid;
        } else {
          hi = mid;
        }
      }
      w[i] = (lo + hi) / 2;
    }
    return w;
  }

  /** Index of a metadata combination, for the precomputed slot weights. */
  private static int combination(Meta meta) {
    return (DEVICE.values().indexOf(meta.device()) * CUSTOMER.values().size()
                + CUSTOMER.values().indexOf(meta.customer()))
            * ORDER_VALUE.values().size()
        + ORDER_VALUE.values().indexOf(meta.orderValue());
  }

  /** Every metadata combination, in {@link #combination} order. */
  static List<Meta> combinations() {
    List<Meta> all = new ArrayList<>();
    for (String device : DEVICE.values()) {
      for (String customer : CUSTOMER.values()) {
        for (String value : ORDER_VALUE.values()) {
          all.add(new Meta(device, customer, value));
        }
      }
    }
    return all;
  }

  private static final class Weights {
    static final double[][][] BY_WAVE = solveAll();

    private static double[][][] solveAll() {
      List<Meta> all = combinations();
      double[][][] w = new double[WAVE_NAMES.size()][all.size()][];
      for (int wave = 0; wave < WAVE_NAMES.size(); wave++) {
        for (int c = 0; c < all.size(); c++) {
          w[wave][c] = slotWeights(wave, all.get(c));
        }
      }
      return w;
    }
  }

  /**
   * Draws the planted themes of one respondent: element 0 for {@link Question#STOPPED}, element 1
   * for {@link Question#CHOSE}, each in catalogue order.
   */
  static List<List<Theme>> drawThemes(int wave, Meta meta, Random r) {
    double[] w = Weights.BY_WAVE[wave][combination(meta)];
    List<Theme> named = new ArrayList<>();
    List<List<Theme>> result = new ArrayList<>();
    for (Question q : Question.values()) {
      double u = r.nextDouble();
      int slots =
          u < SLOT_CHANCES.get(0) ? 1 : u < SLOT_CHANCES.get(0) + SLOT_CHANCES.get(1) ? 2 : 3;
      for (int slot = 0; slot < slots; slot++) {
        double v = r.nextDouble();
        for (int i = 0; i < THEMES.size(); i++) {
          if (THEMES.get(i).question() != q) {
            continue;
          }
          v -= w[i];
          if (v < 0) {
            if (!named.contains(THEMES.get(i))) {
              named.add(THEMES.get(i));
            }
            break;
          }
        }
      }
      for (Theme t : THEMES) {
        Link link = linkOf(t);
        if (t.question() == q
            && link != null
            && !named.contains(t)
            && named.contains(link.anchor())
            && r.nextDouble() < link.added()) {
          named.add(t);
        }
      }
      result.add(THEMES.stream().filter(t -> t.question() == q && named.contains(t)).toList());
    }
    return result;
  }

  /** One respondent's metadata. */
  record Meta(String device, String customer, String orderValue) {
    String value(Column column) {
      if (column == DEVICE) {
        return device;
      }
      return column == CUSTOMER ? customer : orderValue;
    }
  }

  // ---------------------------------------------------------------------------------------------
  // Generated data
  // ---------------------------------------------------------------------------------------------

  /**
   * One generated answer.
   *
   * @param question which question
   * @param text the answer exactly as written to the file
   * @param themes code names of the planted themes, in catalogue order (empty for non-answers)
   * @param nonAnswer whether the text is a non-answer ("", "n/a", "-", "nothing", "no", ".")
   * @param language "en" or one of {@link #LANGUAGES}
   * @param pii kinds of personal data in the text ("email", "phone", "order", "name")
   * @param coded codes recorded by the pilot's coder (with noise); empty outside the pilot
   */
  public record GeneratedAnswer(
      Question question,
      String text,
      List<String> themes,
      boolean nonAnswer,
      String language,
      List<String> pii,
      List<String> coded) {
    /** Copies the lists. */
    public GeneratedAnswer {
      themes = List.copyOf(themes);
      pii = List.copyOf(pii);
      coded = List.copyOf(coded);
    }

    /** Whether the planted themes include {@code theme}. */
    public boolean has(Theme theme) {
      return themes.contains(theme.code());
    }
  }

  /**
   * One generated respondent.
   *
   * @param id response id, e.g. W1-0001
   * @param submittedAt submission date
   * @param device mobile, desktop or tablet
   * @param customer new or returning
   * @param orderValue order value band
   * @param stopped answer to {@link #STOPPED_QUESTION}
   * @param chose answer to {@link #CHOSE_QUESTION}
   * @param codedBy the pilot coder's initials; empty outside the pilot
   */
  public record GeneratedRespondent(
      String id,
      LocalDate submittedAt,
      String device,
      String customer,
      String orderValue,
      GeneratedAnswer stopped,
      GeneratedAnswer chose,
      String codedBy) {

    /** The answer to one question. */
    public GeneratedAnswer answer(Question question) {
      return question == Question.STOPPED ? stopped : chose;
    }
  }

  /**
   * One generated wave.
   *
   * @param index position in import order ({@link #PILOT} .. {@link #WAVE_3})
   * @param name wave name
   * @param file file name in {@code sample-responses/}
   * @param date first fielding day
   * @param precoded whether the file carries codes columns (the pilot)
   * @param respondents the respondents in file order
   */
  public record GeneratedWave(
      int index,
      String name,
      String file,
      LocalDate date,
      boolean precoded,
      List<GeneratedRespondent> respondents) {
    /** Copies the list. */
    public GeneratedWave {
      respondents = List.copyOf(respondents);
    }

    /** Number of substantive answers to a question (the base of a share). */
    public int base(Question question) {
      return (int) respondents.stream().filter(p -> !p.answer(question).nonAnswer()).count();
    }

    /** Number of answers carrying the planted theme. */
    public int count(Theme theme) {
      return (int) respondents.stream().filter(p -> p.answer(theme.question()).has(theme)).count();
    }

    /** Realised share of the planted theme among substantive answers. */
    public double share(Theme theme) {
      return count(theme) / (double) base(theme.question());
    }
  }

  /** How a file is written. */
  private record Format(char delimiter, boolean bom, String lineEnd, String description) {}

  private static final Format SPREADSHEET = new Format(',', false, "\r\n", "comma, UTF-8, CRLF");
  private static final Format EUROPEAN =
      new Format(';', true, "\r\n", "semicolon, UTF-8 with BOM, CRLF");
  private static final Format PLAIN = new Format(',', false, "\n", "comma, UTF-8, LF");
  private static final Format TABS = new Format('\t', false, "\n", "tab, UTF-8, LF");
  private static final List<Format> WAVE_FORMATS = List.of(TABS, SPREADSHEET, EUROPEAN, PLAIN);

  private record Spec(int wave, YearMonth month, int respondents, String idPrefix) {}

  private static final class Demo {
    static final List<GeneratedWave> WAVES = generateDemoWaves(DEMO_SEED);
  }

  /** The demo waves in import order (pilot first), generated once from {@link #DEMO_SEED}. */
  public static List<GeneratedWave> demoWaves() {
    return Demo.WAVES;
  }

  /** The demo waves generated afresh from any seed. */
  public static List<GeneratedWave> generateDemoWaves(long seed) {
    List<GeneratedWave> waves = new ArrayList<>();
    for (int i = 0; i < WAVE_NAMES.size(); i++) {
      waves.add(generateWave(i, WAVE_SIZES.get(i), seed * 31 + i));
    }
    return List.copyOf(waves);
  }

  /**
   * One wave with the planted probabilities of wave {@code index}, {@code respondents} strong,
   * fielded in that wave's month; the pilot ({@link #PILOT}) also gets its coders' codes.
   */
  public static GeneratedWave generateWave(int index, int respondents, long seed) {
    LocalDate date = WAVE_DATES.get(index);
    Spec spec = new Spec(index, YearMonth.from(date), respondents, WAVE_ID_PREFIXES.get(index));
    Random draws = new Random(seed);
    Random words = wordsRandom(seed);
    Random coder = new Random(seed ^ 0x5DEECE66DL);
    List<GeneratedRespondent> list = new ArrayList<>(respondents);
    for (int i = 0; i < respondents; i++) {
      GeneratedRespondent p = respondent(spec, i, draws, words);
      list.add(index == PILOT ? code(p, coderFor(i, respondents), coder) : p);
    }
    return new GeneratedWave(
        index, WAVE_NAMES.get(index), WAVE_FILES.get(index), date, index == PILOT, list);
  }

  /** Wording has its own stream, so editing templates never changes the planted ground truth. */
  private static Random wordsRandom(long seed) {
    return new Random(seed * 0x9E3779B97F4A7C15L + 0x632BE59BD9B4E019L);
  }

  /**
   * One respondent: metadata, planted themes, non-answers and language come from {@code draws}; the
   * wording from {@code words}.
   */
  private static GeneratedRespondent respondent(Spec spec, int index, Random draws, Random words) {
    LocalDate date = submittedAt(spec, index, draws);
    Meta meta = new Meta(DEVICE.draw(draws), CUSTOMER.draw(draws), ORDER_VALUE.draw(draws));
    List<List<Theme>> drawn = drawThemes(spec.wave(), meta, draws);
    String language = draws.nextDouble() < FOREIGN_RATE ? pick(draws, LANGUAGES) : "en";
    boolean skipStopped = draws.nextDouble() < NON_ANSWER_RATE;
    boolean skipChose = draws.nextDouble() < NON_ANSWER_RATE;
    GeneratedAnswer stopped =
        answer(Question.STOPPED, drawn.get(0), meta, spec.wave(), language, skipStopped, words);
    GeneratedAnswer chose =
        answer(Question.CHOSE, drawn.get(1), meta, spec.wave(), language, skipChose, words);
    int width = Math.max(4, Integer.toString(spec.respondents()).length());
    String id = spec.idPrefix() + "-" + pad(index + 1, width);
    return new GeneratedRespondent(
        id, date, meta.device(), meta.customer(), meta.orderValue(), stopped, chose, "");
  }

  /** Answers arrive mostly in the first days after the invitation, in id order. */
  private static LocalDate submittedAt(Spec spec, int index, Random r) {
    double u = (index + r.nextDouble()) / spec.respondents();
    int days = spec.month().lengthOfMonth();
    int day = 1 + (int) (days * StrictMath.pow(u, 1.7));
    return spec.month().atDay(Math.min(day, days));
  }

  private static String pad(int n, int width) {
    StringBuilder s = new StringBuilder(Integer.toString(n));
    while (s.length() < width) {
      s.insert(0, '0');
    }
    return s.toString();
  }

  // ---------------------------------------------------------------------------------------------
  // Pilot coding (an earlier wave coded by hand elsewhere, with realistic slips)
  // ---------------------------------------------------------------------------------------------

  /** Pilot coders' initials, each with the share of rows coded, miss rate and wrong-code rate. */
  private static final List<String> CODERS = List.of("AK", "JR", "MT");

  private static final double[] CODER_SHARE = {0.42, 0.34, 0.24};
  private static final double[] CODER_MISS = {0.030, 0.050, 0.035};
  private static final double[] CODER_WRONG = {0.015, 0.025, 0.020};

  /** Coders split the file in blocks, as teams do. */
  private static int coderFor(int index, int respondents) {
    double u = (index + 0.5) / respondents;
    for (int c = 0; c < CODERS.size() - 1; c++) {
      u -= CODER_SHARE[c];
      if (u < 0) {
        return c;
      }
    }
    return CODERS.size() - 1;
  }

  /** Separator of the coder's codes; JR's tool writes "|". */
  static String codeSeparator(String coder) {
    return coder.equals("JR") ? "|" : "; ";
  }

  private static GeneratedRespondent code(GeneratedRespondent p, int coder, Random r) {
    return new GeneratedRespondent(
        p.id(),
        p.submittedAt(),
        p.device(),
        p.customer(),
        p.orderValue(),
        coded(p.stopped(), coder, r),
        coded(p.chose(), coder, r),
        CODERS.get(coder));
  }

  private static GeneratedAnswer coded(GeneratedAnswer a, int coder, Random r) {
    if (a.nonAnswer()) {
      return a;
    }
    List<Theme> pool = themes(a.question());
    List<String> codes = new ArrayList<>();
    for (String code : a.themes()) {
      double u = r.nextDouble();
      if (u < CODER_MISS[coder]) {
        continue;
      }
      String chosen = code;
      if (u < CODER_MISS[coder] + CODER_WRONG[coder]) {
        chosen = nearby(theme(code), pool, r).code();
      }
      if (!codes.contains(chosen)) {
        codes.add(chosen);
      }
    }
    if (r.nextDouble() < 0.012) {
      String extra = pick(r, pool).code();
      if (!codes.contains(extra)) {
        codes.add(extra);
      }
    }
    return new GeneratedAnswer(
        a.question(), a.text(), a.themes(), a.nonAnswer(), a.language(), a.pii(), codes);
  }

  /** A wrong code is usually a sibling under the same parent. */
  private static Theme nearby(Theme theme, List<Theme> pool, Random r) {
    List<Theme> siblings = new ArrayList<>();
    for (Theme t : pool) {
      if (t != theme && t.parent().equals(theme.parent())) {
        siblings.add(t);
      }
    }
    if (siblings.isEmpty() || r.nextDouble() < 0.3) {
      siblings.clear();
      for (Theme t : pool) {
        if (t != theme) {
          siblings.add(t);
        }
      }
    }
    return pick(r, siblings);
  }

  // ---------------------------------------------------------------------------------------------
  // Wording
  // ---------------------------------------------------------------------------------------------

  static final List<String> MACHINES =
      List.of("Velle Duo 2", "Quillo Mini", "Tarvo Lever", "Ardet One", "Brunic Pro");
  static final List<String> GRINDERS = List.of("Kivo 48", "Lunner 64", "Pell Flat 58");
  private static final List<String> BUDGETS = List.of("300", "400", "500", "€350", "600");
  private static final List<String> DAYS = List.of("2", "3", "two", "three");

  private static final List<String> NON_ANSWERS_STOPPED =
      List.of("", "", "", "", "n/a", "N/A", "-", "nothing", "nothing", "Nothing", "no", ".");
  private static final List<String> NON_ANSWERS_CHOSE =
      List.of("", "", "", "", "n/a", "-", "-", "no", ".", "none", "nothing");

  /**
   * Substantive answers with no planted theme. Off-catalogue reasons are idiosyncratic, as in real
   * surveys: each wording belongs to one buyer's situation and is picked from a hundred, so any one
   * of them is given by few respondents and none recurs the way a planted theme does. They avoid
   * the planted themes' words.
   */
  static final List<String> MISC_STOPPED =
      List.of(
          "my cat knocked the old one off the counter, so this was [a bit of a|kind of a] panic buy",
          "I was on night shifts all month and kept putting it off",
          "the coupon box rejected my code twice",
          "I kept the tab open for [two weeks|ten days] before I committed",
          "my landlord has rules about appliances, weirdly",
          "my sister swears by her moka pot and kept teasing me",
          "I had just bought a new kettle and felt silly buying another gadget",
          "the colour in the photos looked more green than silver",
          "I dropped my phone halfway through and lost the basket",
          "the site logged me out when I switched apps",
          "I'd read that lever machines need practice and I have zero patience",
          "my neighbour offered me his old machine for free",
          "the chat bubble kept popping up over the basket button",
          "my daughter wanted a pink one and there were only black ones",
          "I wondered about the noise, our baby sleeps [lightly|badly]",
          "my flatmates and I couldn't agree on who would clean it",
          "I was halfway through a coffee detox",
          "I thought I might win one in a raffle at work",
          "we gave up caffeine for Lent, so the timing was odd",
          "I couldn't work out which milk jug to add",
          "the tamper options confused me",
          "the filter for single boilers kept resetting",
          "my doctor told me to cut down on coffee, ha",
          "I got distracted by the football",
          "it was 2am and I didn't trust my own judgement",
          "a pod machine put me off coffee gadgets for years",
          "the captcha made me pick traffic lights five times",
          "I wanted to try one at a friend's place first",
          "I wanted to wait for my birthday so it felt like a present to myself",
          "my mother-in-law says espresso is bad for the heart",
          "[I was afraid|afraid] the steam would set off our smoke alarm",
          "the newsletter pop-up asked for my birthday, which felt odd",
          "I only drink decaf and didn't know if that works",
          "our fuse trips when the kettle and the toaster run together",
          "the quiz that recommends a machine sent me in circles",
          "I wanted a timer so it's ready when I wake up",
          "my old grinder is loud and I hoped to replace both at once",
          "the product video wouldn't play on my laptop",
          "I'm left-handed and wondered which side the steam wand is on",
          "I live on a narrowboat and power is limited",
          "our office was getting a machine anyway, or so they said",
          "I wanted the water tank reachable from the front, I use a wheelchair",
          "the font on the spec sheet was tiny",
          "I'd miss my café visits and the chats with the staff there",
          "I was tempted to learn pour-over instead",
          "my brother is a barista and had strong opinions",
          "honestly, my horoscope said no big decisions that week",
          "my roommate already owns a machine, just a terrible one",
          "the dog licks everything and I pictured the drip tray",
          "the basket showed the wrong country flag",
          "I couldn't find out whether the portafilter is 58 or 54 mm",
          "I needed to check if my oat milk would froth",
          "I was away at a music festival for a week",
          "our kitchen is all matte black and the chrome worried me",
          "the search box autocorrected lever to clever",
          "my hands shake a bit and tamping looked fiddly",
          "we had a leak in the kitchen ceiling that week",
          "the cart icon didn't show how many items were in it",
          "I thought I'd end up drinking six a day",
          "I'd just come back from a trip to Naples and everything tasted flat",
          "the confirmation email went to spam the last time I ordered online",
          "I wanted to hear how it sounds, the videos were muted",
          "the site switched to German on its own",
          "I wasn't sure the group head would take my old basket",
          "I read about backflushing for an hour and got cold feet",
          "I wanted a hot water tap for tea as well",
          "I worried I'd get hooked on latte art videos",
          "our kitchen has one socket and it's behind the fridge",
          "honestly I was just tired that evening",
          "I had three tabs with three machines open and froze",
          "I couldn't tell if the cups in the photo come with it",
          "the accessories bundle I wanted was sold out",
          "the counter said 1 left and it felt like a trick",
          "I couldn't pick between matte and gloss",
          "a friend warned me home espresso is a rabbit hole",
          "it was Ramadan and coffee was the last thing on my mind",
          "my partner thought I'd stop joining him at the bakery",
          "we're getting a puppy and the flat will be chaos",
          "I had to ask my flatmates if we'd share it",
          "the only free spot gets full sun in the afternoon",
          "the page kept jumping around while the images loaded",
          "I was nervous about burning myself on the steam",
          "our water comes from a well",
          "I spent ages choosing a scale to go with it",
          "I wanted to wait until we moved to the new flat",
          "I can't have caffeine after noon",
          "a colleague kept sending me videos of espresso fails",
          "the site asked me twice to allow notifications",
          "the wishlist button didn't save anything",
          "I was doing an evening course and had no time to think",
          "I couldn't remember my password from years ago",
          "comparing two machines side by side took a lot of clicking",
          "my grandma thinks coffee should only come from a stovetop pot",
          "the power rating made me wonder about our old wiring",
          "grinding beans every morning before work sounded like a chore",
          "there was a heatwave and hot coffee felt wrong",
          "I was in hospital for a bit, so it waited",
          "I worried it would be too clever for me",
          "the explanation of the filter baskets went over my head",
          "I had just started a new job",
          "my hands were full with a newborn",
          "I had a dentist appointment and forgot about it for days",
          "my partner is a tea snob",
          "the font on the checkout button was grey on grey",
          "I wanted to sell my old machine first");

  /** Off-catalogue answers that only appear once checkout shows the date and the warranty. */
  static final List<String> MISC_AFTER_CHANGE =
      List.of(
          "nothing, the delivery date was right there at checkout",
          "not much, the warranty was clearly shown so I went for it",
          "nothing really, I could see when it would arrive and that was enough",
          "nothing, checkout said exactly which day it would come",
          "not much this time, the 12-month warranty was on the page",
          "nothing, I liked seeing the date before paying",
          "nothing really, the warranty badge at checkout settled it",
          "all clear this time, date and warranty were both shown");

  static final List<String> MISC_CHOSE =
      List.of(
          "your logo looks like the sign of my grandfather's old café",
          "the name sounded like a place from a novel I love",
          "I saw one of your machines in my dentist's waiting room",
          "my barber has one of yours",
          "the About page has a photo of the workshop dog",
          "you sponsor the cycling club in my town",
          "the site loaded fine on my ancient laptop",
          "I liked the tone of the product texts, a bit funny",
          "the blog post about dialling in a lever machine",
          "my colleague has the same machine in the office kitchen",
          "the colour matches my toaster exactly",
          "the site worked with my screen reader",
          "I could check out as a guest",
          "my cousin knows one of the people who work there",
          "I heard you on a local radio show",
          "the little animation when something goes into the basket",
          "you were on a podcast I listen to",
          "the name reminded me of a river near where I grew up",
          "my partner picked it, I just clicked order",
          "I like supporting a small team",
          "no fake countdowns or other tricks on the site",
          "the machine names are fun",
          "you write in plain language",
          "the photo of the team with their own cups",
          "the basket was still there after I closed the browser",
          "the espresso recipe cards on the blog",
          "your stand at the farmers market",
          "a friend had one at her housewarming and it was lovely",
          "the hotel I stayed in had one of your machines at breakfast",
          "the product page gave the exact weight and depth",
          "I like the colours of the website",
          "the photos of the workshop gave me a good feeling",
          "the story of how the founder fixed his first machine",
          "your latte art posts",
          "my book club was talking about you",
          "I wanted a machine with a story",
          "gut feeling, mostly",
          "the machine names made me smile",
          "spare gaskets are sold separately",
          "the order pages are in my language",
          "the photos were taken in a real kitchen, not a studio",
          "I just liked the look of the {machine}",
          "the e-mails sound like a person wrote them",
          "your workshop is near my office and I walk past it",
          "someone from your team replied to a comment of mine months ago",
          "my dad got his first grinder from you years ago",
          "the description says how loud it is in decibels",
          "the handwritten font on the box",
          "the cup warmer on the {machine}",
          "I loved the colour of the {machine}",
          "no account needed",
          "I needed one before my in-laws visited",
          "the photos have a ruler next to the machine",
          "the site feels calm",
          "an ad at exactly the right moment",
          "my espresso cup collection needed a machine",
          "I like shops with a workshop I could visit",
          "the video of the steam wand filmed from above",
          "the descaling reminder email idea",
          "you close the shop on Sundays, I respect that");

  private static final List<String> CONTEXT_STOPPED =
      List.of(
          "it's my first proper espresso machine",
          "I had been looking for months",
          "I compared three or four shops",
          "we drink a LOT of coffee at home",
          "I was buying it as a gift for my dad",
          "my old machine died last month",
          "I'd had my eye on the {machine} for a while");

  private static final List<String> CLOSERS_STOPPED =
      List.of(
          "ordered anyway in the end",
          "but it all worked out",
          "glad I went for it though",
          "in the end I took the chance",
          "my partner talked me into it",
          "happy with it now",
          "would have been nice to know upfront");

  private static final List<String> CONTEXT_CHOSE =
      List.of(
          "I had been comparing shops for weeks",
          "the {machine} is exactly what I wanted",
          "I wanted to upgrade from pods",
          "first time buying refurbished");

  private static final List<String> CONTEXT_RETURNING =
      List.of("second time ordering from you", "I bought my grinder here last year");

  private static final List<String> CLOSERS_CHOSE =
      List.of(
          "will order again",
          "very happy with it so far",
          "keep it up!",
          "love the machine",
          "would recommend",
          "thanks!");

  private static final List<String> OPENERS_STOPPED =
      List.of("honestly, ", "tbh ", "to be fair, ", "mostly ", "hmm, ", "the only thing was ");
  private static final List<String> OPENERS_CHOSE =
      List.of("mainly ", "mostly ", "honestly ", "the main thing was ", "simple: ");

  private static final List<String> SHORT_JOINS =
      List.of(" and ", ", ", " + ", " / ", "; ", " & ", "\n", " and ");
  private static final List<String> CONNECTORS =
      List.of(", and ", " and ", ", plus ", " and also ", "; ", " - ", "... ", ", also ");

  private static final List<String> EMOJI_FRICTION = List.of("😅", "☕", "🙈", "🤔");
  private static final List<String> EMOJI_PRAISE = List.of("☕", "👍", "🙂", "☕☕");

  private static final List<String> EMAILS =
      List.of(
          "anna.k@example.com",
          "tom.r84@example.org",
          "lea.moreau@example.net",
          "j.okafor@example.com",
          "mila_b@example.org",
          "sanne.v@example.net",
          "pdu@example.com",
          "k.lindqvist@example.org");
  private static final List<String> NAMES =
      List.of(
          "Jonas", "Priya", "Malin", "Tomasz", "Aiko", "Ines", "Kofi", "Nadia", "Ruben", "Elif");

  private static final Pattern STANDALONE_I = Pattern.compile("\\bI\\b");
  private static final Pattern EMPHASIS =
      Pattern.compile("\\b(really|not|never|so|very|way|much|no)\\b");

  private record Style(boolean lower, boolean sloppy) {}

  private static GeneratedAnswer answer(
      Question question,
      List<Theme> themes,
      Meta meta,
      int wave,
      String language,
      boolean skipped,
      Random r) {
    if (skipped) {
      List<String> pool = question == Question.STOPPED ? NON_ANSWERS_STOPPED : NON_ANSWERS_CHOSE;
      return new GeneratedAnswer(
          question, pick(r, pool), List.of(), true, "en", List.of(), List.of());
    }
    String text;
    String lang = "en";
    if (!language.equals("en") && !themes.isEmpty()) {
      text = foreign(themes, language, r);
      lang = language;
    } else {
      text = english(question, themes, meta, wave, r);
    }
    List<String> pii = new ArrayList<>();
    if (r.nextDouble() < PII_RATE) {
      text = withPii(text, pii, r);
    }
    if (r.nextDouble() < 0.01) {
      text = text + " ";
    }
    List<String> codes = themes.stream().map(Theme::code).toList();
    return new GeneratedAnswer(question, text, codes, false, lang, pii, List.of());
  }

  private static String foreign(List<Theme> themes, String language, Random r) {
    List<Theme> order = new ArrayList<>(themes);
    Collections.shuffle(order, r);
    StringBuilder s = new StringBuilder();
    for (Theme t : order) {
      if (s.length() > 0) {
        s.append(' ');
      }
      s.append(t.translation(language));
    }
    return s.toString();
  }

  private static String english(
      Question question, List<Theme> themes, Meta meta, int wave, Random r) {
    List<Theme> order = new ArrayList<>(themes);
    Collections.shuffle(order, r);
    double u = r.nextDouble();
    Style style = new Style(u < 0.22, u < 0.14 || (u >= 0.22 && u < 0.30));
    boolean praise = question == Question.CHOSE;
    String text;
    if (order.isEmpty()) {
      List<String> pool = praise ? MISC_CHOSE : MISC_STOPPED;
      if (!praise && wave >= WAVE_3 && r.nextDouble() < 0.12) {
        pool = MISC_AFTER_CHANGE;
      }
      text = sentences(List.of(expand(pick(r, pool), r)), style, r);
    } else {
      double form = r.nextDouble();
      if (form < 0.28) {
        text = shortAnswer(order, style, r);
      } else if (form < 0.66) {
        text = sentences(withOpener(body(order, r), question, r), style, r);
      } else {
        text = sentences(longBody(order, question, meta, r), style, r);
      }
    }
    return decorate(text, style, praise, r);
  }

  private static String shortAnswer(List<Theme> themes, Style style, Random r) {
    StringBuilder s = new StringBuilder();
    String join = pick(r, SHORT_JOINS);
    for (Theme t : themes) {
      if (s.length() > 0) {
        s.append(join);
      }
      s.append(expand(pick(r, t.shortForms()), r));
    }
    double u = r.nextDouble();
    if (u < 0.08) {
      s.append("??");
    } else if (u < 0.12) {
      s.append("!");
    } else if (u < 0.16) {
      s.append("...");
    }
    String text = s.toString();
    return !style.lower() && r.nextDouble() < 0.5 ? capitalise(text) : text;
  }

  /** One sentence per theme; pairs are often joined into one sentence. */
  private static List<String> body(List<Theme> themes, Random r) {
    List<String> units = new ArrayList<>();
    for (Theme t : themes) {
      units.add(expand(pick(r, t.sentences()), r));
    }
    if (units.size() >= 2 && r.nextDouble() < 0.5) {
      String first = stripEnd(units.remove(0));
      units.set(0, first + pick(r, CONNECTORS) + units.get(0));
    }
    return units;
  }

  /** Sometimes starts with "honestly", "tbh", "mainly" and the like. */
  private static List<String> withOpener(List<String> units, Question question, Random r) {
    if (r.nextDouble() < 0.22) {
      List<String> openers = question == Question.CHOSE ? OPENERS_CHOSE : OPENERS_STOPPED;
      String opener = pick(r, openers);
      String word = opener.split("[ ,:]")[0];
      String first = units.get(0).toLowerCase(Locale.ROOT);
      if (!first.startsWith(word) && !first.startsWith("honestly")) {
        units.set(0, opener + units.get(0));
      }
    }
    return units;
  }

  /** Two to four sentences: the themes plus some context and a closing remark. */
  private static List<String> longBody(List<Theme> themes, Question question, Meta meta, Random r) {
    List<String> units = withOpener(body(themes, r), question, r);
    boolean praise = question == Question.CHOSE;
    if (r.nextDouble() < 0.5 || units.size() == 1) {
      List<String> pool = new ArrayList<>(praise ? CONTEXT_CHOSE : CONTEXT_STOPPED);
      if (praise && meta.customer().equals("returning")) {
        pool.addAll(CONTEXT_RETURNING);
      }
      String context = expand(pick(r, pool), r);
      if (r.nextDouble() < 0.5) {
        units.add(0, context);
      } else {
        units.add(context);
      }
    }
    if (units.size() < 4 && r.nextDouble() < 0.55) {
      units.add(expand(pick(r, praise ? CLOSERS_CHOSE : CLOSERS_STOPPED), r));
    }
    return units;
  }

  /** Joins units into sentences, as a list, on separate lines, or as running text. */
  private static String sentences(List<String> units, Style style, Random r) {
    double u = r.nextDouble();
    if (units.size() >= 2 && u < 0.05) {
      StringBuilder s = new StringBuilder();
      for (String unit : units) {
        if (s.length() > 0) {
          s.append('\n');
        }
        s.append("- ").append(style.lower() ? unit : capitalise(stripEnd(unit)));
      }
      return s.toString();
    }
    String join = units.size() >= 2 && u < 0.13 ? "\n" : " ";
    StringBuilder s = new StringBuilder();
    for (int i = 0; i < units.size(); i++) {
      String unit = units.get(i);
      if (i > 0) {
        s.append(join);
      }
      s.append(style.lower() ? unit : capitalise(unit));
      boolean last = i == units.size() - 1;
      boolean dropPeriod = last && (style.lower() ? r.nextDouble() < 0.6 : r.nextDouble() < 0.1);
      if (!endsWithPunctuation(unit) && !dropPeriod) {
        s.append('.');
      }
    }
    return s.toString();
  }

  /** Lower case, dropped apostrophes, typos, shouting and emoji. */
  private static String decorate(String text, Style style, boolean praise, Random r) {
    String s = text;
    if (style.lower()) {
      s = STANDALONE_I.matcher(s).replaceAll("i");
    }
    if (style.sloppy()) {
      s = s.replace("n't", "nt").replace("I'm", "Im").replace("i'm", "im");
    }
    if (r.nextDouble() < 0.08) {
      s = typo(s, r);
    }
    if (r.nextDouble() < 0.05) {
      var m = EMPHASIS.matcher(s);
      if (m.find()) {
        s = s.substring(0, m.start()) + m.group().toUpperCase(Locale.ROOT) + s.substring(m.end());
      }
    }
    if (r.nextDouble() < 0.05) {
      s = s + (r.nextDouble() < 0.7 ? " " : "") + pick(r, praise ? EMOJI_PRAISE : EMOJI_FRICTION);
    }
    return s;
  }

  /** Swaps two letters inside one longer word. */
  private static String typo(String s, Random r) {
    List<Integer> starts = new ArrayList<>();
    int i = 0;
    while (i < s.length()) {
      int j = i;
      while (j < s.length() && s.charAt(j) >= 'a' && s.charAt(j) <= 'z') {
        j++;
      }
      if (j - i >= 5) {
        starts.add(i);
      }
      i = Math.max(j, i + 1);
    }
    if (starts.isEmpty()) {
      return s;
    }
    int start = pick(r, starts);
    int k = start + 1 + r.nextInt(3);
    char[] c = s.toCharArray();
    char t = c[k];
    c[k] = c[k + 1];
    c[k + 1] = t;
    return new String(c);
  }

  private static String withPii(String text, List<String> pii, Random r) {
    String name = pick(r, NAMES);
    String email = pick(r, EMAILS);
    String sentence;
    double u = r.nextDouble();
    if (u < 0.3) {
      pii.add("email");
      sentence =
          pick(
              r,
              List.of(
                  "you can reach me at " + email,
                  "email me at " + email + " if you need more",
                  "contact: " + email));
    } else if (u < 0.5) {
      pii.add("phone");
      String phone =
          r.nextBoolean()
              ? "07700 900" + pad(r.nextInt(1000), 3)
              : "202-555-01" + pad(r.nextInt(100), 2);
      sentence =
          pick(
              r,
              List.of("call me on " + phone, "my number is " + phone, "happy to chat, " + phone));
    } else if (u < 0.75) {
      pii.add("order");
      String order = "ORD-" + (10_000 + r.nextInt(90_000));
      sentence =
          pick(
              r,
              List.of("my order was " + order, "order number " + order, "(order " + order + ")"));
    } else if (u < 0.9) {
      pii.add("name");
      sentence = pick(r, List.of("my name is " + name, "ask for " + name + " if you call back"));
    } else {
      pii.add("name");
      pii.add("email");
      sentence = "my name is " + name + ", " + email;
    }
    if (text.isEmpty()) {
      return sentence;
    }
    if (r.nextDouble() < 0.15) {
      return text + "\n\n" + capitalise(sentence);
    }
    boolean upper = Character.isUpperCase(text.codePointAt(0));
    if (Character.isLetterOrDigit(text.codePointBefore(text.length()))) {
      return text + (upper ? ". " + capitalise(sentence) : ", " + sentence);
    }
    return text + " " + (upper ? capitalise(sentence) : sentence);
  }

  /** Fills {@code [a|b]} alternatives and {@code {slot}} details. */
  static String expand(String template, Random r) {
    if (template.indexOf('[') < 0 && template.indexOf('{') < 0) {
      return template;
    }
    StringBuilder s = new StringBuilder();
    int i = 0;
    while (i < template.length()) {
      char c = template.charAt(i);
      if (c == '[') {
        int end = template.indexOf(']', i);
        s.append(pick(r, List.of(template.substring(i + 1, end).split("\\|", -1))));
        i = end + 1;
      } else if (c == '{') {
        int end = template.indexOf('}', i);
        String name = template.substring(i + 1, end);
        String value = slot(name, r);
        while (name.equals("machine2") && s.indexOf(value) >= 0) {
          value = slot(name, r);
        }
        s.append(value);
        i = end + 1;
      } else {
        s.append(c);
        i++;
      }
    }
    return s.toString().replace("  ", " ");
  }

  private static String slot(String name, Random r) {
    return switch (name) {
      case "machine", "machine2" -> pick(r, MACHINES);
      case "grinder" -> pick(r, GRINDERS);
      case "budget" -> pick(r, BUDGETS);
      case "days" -> pick(r, DAYS);
      default -> throw new IllegalArgumentException("unknown slot " + name);
    };
  }

  private static String capitalise(String s) {
    return s.isEmpty() ? s : s.substring(0, 1).toUpperCase(Locale.ROOT) + s.substring(1);
  }

  private static String stripEnd(String s) {
    return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
  }

  private static boolean endsWithPunctuation(String s) {
    if (s.isEmpty()) {
      return true;
    }
    char c = s.charAt(s.length() - 1);
    return c == '.' || c == '?' || c == '!' || c == ':' || Character.isSurrogate(c);
  }

  private static <T> T pick(Random r, List<T> list) {
    return list.get(r.nextInt(list.size()));
  }

  // ---------------------------------------------------------------------------------------------
  // Files
  // ---------------------------------------------------------------------------------------------

  /** (Re)writes the demo files into {@code args[0]} (default {@code sample-responses}). */
  public static void main(String[] args) throws IOException {
    Path dir = Path.of(args.length > 0 ? args[0] : "sample-responses");
    writeAll(dir);
    List<GeneratedWave> waves = demoWaves();
    for (GeneratedWave w : waves) {
      System.out.println(dir.resolve(w.file()) + ": " + w.respondents().size() + " respondents");
    }
    System.out.println(dir.resolve(MANIFEST) + ", " + dir.resolve(README));
  }

  /** Writes every file of {@link #GENERATED_FILES} into {@code dir}. */
  public static void writeAll(Path dir) throws IOException {
    Files.createDirectories(dir);
    List<GeneratedWave> waves = demoWaves();
    for (GeneratedWave w : waves) {
      writeWave(w, dir.resolve(w.file()));
    }
    StringBuilder manifest = new StringBuilder("file,wave,date\n");
    for (GeneratedWave w : waves) {
      manifest.append(w.file()).append(',').append(w.name()).append(',').append(w.date());
      manifest.append('\n');
    }
    Files.writeString(dir.resolve(MANIFEST), manifest, StandardCharsets.UTF_8);
    Files.writeString(dir.resolve(README), readme(waves), StandardCharsets.UTF_8);
  }

  /** Writes one wave in its own file format (see the README). */
  public static void writeWave(GeneratedWave wave, Path file) throws IOException {
    Format format = WAVE_FORMATS.get(wave.index());
    try (Writer w = writer(file)) {
      if (format.bom()) {
        w.write('\uFEFF');
      }
      writeRow(w, wave.precoded() ? PILOT_COLUMNS : COLUMNS, format);
      for (GeneratedRespondent p : wave.respondents()) {
        writeRow(w, cells(p, wave.precoded()), format);
      }
    }
  }

  /**
   * Streams a large export with the columns of {@link #COLUMNS} (comma, UTF-8, LF) and wave 1's
   * planted probabilities, one respondent at a time.
   */
  public static void writeLargeExport(Path out, int respondents, long seed) throws IOException {
    Spec spec = new Spec(WAVE_1, YearMonth.from(WAVE_DATES.get(WAVE_1)), respondents, "L");
    Random draws = new Random(seed);
    Random words = wordsRandom(seed);
    try (Writer w = writer(out)) {
      writeRow(w, COLUMNS, PLAIN);
      for (int i = 0; i < respondents; i++) {
        writeRow(w, cells(respondent(spec, i, draws, words), false), PLAIN);
      }
    }
  }

  private static Writer writer(Path file) throws IOException {
    return new BufferedWriter(
        new OutputStreamWriter(Files.newOutputStream(file), StandardCharsets.UTF_8), 1 << 16);
  }

  private static List<String> cells(GeneratedRespondent p, boolean precoded) {
    List<String> cells = new ArrayList<>(10);
    cells.add(p.id());
    cells.add(p.submittedAt().toString());
    cells.add(p.device());
    cells.add(p.customer());
    cells.add(p.orderValue());
    cells.add(p.stopped().text());
    if (precoded) {
      cells.add(String.join(codeSeparator(p.codedBy()), p.stopped().coded()));
    }
    cells.add(p.chose().text());
    if (precoded) {
      cells.add(String.join(codeSeparator(p.codedBy()), p.chose().coded()));
      cells.add(p.codedBy());
    }
    return cells;
  }

  private static void writeRow(Writer w, List<String> cells, Format format) throws IOException {
    for (int i = 0; i < cells.size(); i++) {
      if (i > 0) {
        w.write(format.delimiter());
      }
      w.write(quote(cells.get(i), format.delimiter()));
    }
    w.write(format.lineEnd());
  }

  /**
   * Quotes a cell the way spreadsheets do: only when it holds the delimiter, a quote or a break.
   */
  static String quote(String cell, char delimiter) {
    if (cell.indexOf(delimiter) < 0
        && cell.indexOf('"') < 0
        && cell.indexOf('\n') < 0
        && cell.indexOf('\r') < 0) {
      return cell;
    }
    return '"' + cell.replace("\"", "\"\"") + '"';
  }

  // ---------------------------------------------------------------------------------------------
  // README
  // ---------------------------------------------------------------------------------------------

  private static String percent(double share) {
    return String.format(Locale.ROOT, "%.1f", 100 * share);
  }

  private static String readme(List<GeneratedWave> waves) {
    StringBuilder s = new StringBuilder();
    s.append("# Demo survey waves: Ondalune\n\n");
    s.append(
        "Everything in this folder is invented: the shop, its machines, the buyers, their answers,"
            + "\ntheir e-mail addresses (reserved domains), phone numbers (fictional ranges) and"
            + " order numbers.\nThe files are written by `src/test/java/riffle/tools/"
            + "SampleResponses.java`, a pure function of\nits seed; do not edit them by hand.\n\n");
    s.append("## Scenario\n\n");
    s.append(
            "Ondalune (`ondalune.example`) sells refurbished espresso machines and grinders online."
                + "\nAfter each order it asks buyers two open questions, \"")
        .append(STOPPED_QUESTION)
        .append("\" and\n\"")
        .append(CHOSE_QUESTION)
        .append(
            "\", and records a little metadata. A pilot was fielded in December 2025 and"
                + " coded\nby hand elsewhere; waves 1 to 3 followed in March, June and September"
                + " 2026.\n\n");
    s.append(
        "**The site change.** Between wave 2 and wave 3 the shop began to show a firm delivery"
            + " date and\nits 12-month warranty at checkout. The two friction themes tied to that"
            + " change, `delivery date\nunclear` and `warranty doubts` (including whether a"
            + " refurbished machine will last), fall clearly\nin wave 3. Every other theme has the"
            + " same planted probability in all waves, so a correct\nwave comparison flags those two"
            + " falls and nothing else.\n\n");
    s.append("## Files\n\n");
    s.append("Listed in import order in `").append(MANIFEST).append("` (`file,wave,date`).");
    s.append(" `codebook.csv` is the theme\ncatalogue as a codebook file (`name,theme,direction`):")
        .append(
            " the demo loads it after the imports, so\nthat the pilot's imported codes sit under")
        .append(" their themes with their directions\n(`SampleCodebookTest` checks it against the")
        .append(" generator).\n\n");
    s.append("| file | wave | fielded from | respondents | format |\n");
    s.append("|---|---|---|---|---|\n");
    for (GeneratedWave w : waves) {
      s.append("| `").append(w.file()).append("` | ").append(w.name()).append(" | ");
      s.append(w.date()).append(" | ").append(w.respondents().size()).append(" | ");
      s.append(WAVE_FORMATS.get(w.index()).description()).append(" |\n");
    }
    s.append(
        "\nAnswers may contain the delimiter, double quotes and line breaks; such cells are quoted"
            + " the way\nspreadsheets do (`\"` doubled inside). Line breaks inside a cell are LF in"
            + " every file, so the\nnumber of physical lines is larger than the number of"
            + " respondents.\n\n");
    s.append("## Columns\n\n");
    s.append("| column | content |\n|---|---|\n");
    s.append("| `response_id` | e.g. `W1-0001`; the pilot uses `PL-0001` |\n");
    s.append("| `submitted_at` | ISO date (YYYY-MM-DD) within the fielding month |\n");
    s.append("| `device` | ").append(categories(DEVICE)).append(" |\n");
    s.append("| `customer` | ").append(categories(CUSTOMER)).append(" |\n");
    s.append("| `order_value` | ")
        .append(categories(ORDER_VALUE))
        .append(" (currency-neutral) |\n");
    s.append("| `").append(STOPPED_QUESTION).append("` | open text |\n");
    s.append("| `").append(STOPPED_CODES).append("` | pilot only, right after the question |\n");
    s.append("| `").append(CHOSE_QUESTION).append("` | open text |\n");
    s.append("| `").append(CHOSE_CODES).append("` | pilot only, right after the question |\n");
    s.append("| `").append(CODED_BY).append("` | pilot only, the coder's initials |\n\n");
    s.append("## Planted themes\n\n");
    s.append(
        "Chance that a substantive answer (not a non-answer) carries the theme, per wave. The"
            + " code names\nare the ones the pilot's codes columns use.\n\n");
    s.append("| code | parent | direction | question | Pilot | Wave 1 | Wave 2 | Wave 3 |\n");
    s.append("|---|---|---|---|---|---|---|---|\n");
    for (Theme t : THEMES) {
      s.append("| `").append(t.code()).append("` | ").append(t.parent()).append(" | ");
      s.append(t.direction().label()).append(" | ");
      s.append(t.question() == Question.STOPPED ? "stopped" : "chose");
      for (int i = 0; i < WAVE_NAMES.size(); i++) {
        s.append(" | ").append(Math.round(100 * t.probability(i))).append('%');
      }
      s.append(" |\n");
    }
    s.append("\nRealised shares in the files (ground truth, % of substantive answers):\n\n");
    s.append("| code | Pilot | Wave 1 | Wave 2 | Wave 3 |\n|---|---|---|---|---|\n");
    for (Theme t : THEMES) {
      s.append("| `").append(t.code()).append('`');
      for (GeneratedWave w : waves) {
        s.append(" | ").append(percent(w.share(t)));
      }
      s.append(" |\n");
    }
    s.append("| substantive answers (stopped / chose)");
    for (GeneratedWave w : waves) {
      s.append(" | ").append(w.base(Question.STOPPED)).append(" / ");
      s.append(w.base(Question.CHOSE));
    }
    s.append(" |\n\n");
    s.append(
        "Each answer names one ("
            + Math.round(100 * SLOT_CHANCES.get(0))
            + "%), two ("
            + Math.round(100 * SLOT_CHANCES.get(1))
            + "%) or three ("
            + Math.round(100 * SLOT_CHANCES.get(2))
            + "%) things; each is a planted theme or\nsomething off the catalogue. Slot weights"
            + " are solved per wave and metadata"
            + " combination so that\nevery theme keeps exactly its planted probability.\n\n");
    s.append(
        "Themes that travel together: when the first is named and the second is not, the second"
            + " is added\nwith the given chance (lift = observed co-occurrence over what"
            + " independence would give, all\nwaves):\n\n");
    for (Link l : LINKS) {
      s.append("- `").append(l.anchor().code()).append("` → `").append(l.theme().code());
      s.append("`: ").append(Math.round(100 * l.added())).append("%, lift ");
      s.append(String.format(Locale.ROOT, "%.1f", lift(waves, l.anchor(), l.theme())));
      s.append(l.anchor().question() == l.theme().question() ? "" : " (across the questions)");
      s.append('\n');
    }
    s.append("\nTies to metadata (planted probabilities stay exact overall):\n\n");
    for (Lean l : LEANS) {
      s.append("- `").append(l.theme().code()).append("` is ×");
      s.append(String.format(Locale.ROOT, "%.2f", l.factor())).append(" as likely when `");
      s.append(l.column().name()).append("` is ").append(l.value()).append('\n');
    }
    s.append("\n## What the answers look like\n\n");
    s.append(
        "Short (\"price\", \"delivery time??\") and long (two to four sentences) answers, often"
            + " naming two or\nthree themes at once, in several surface variants (\"delivery"
            + " date\", \"when it would be\ndelivered\", \"no delivery date shown\"; \"worth the"
            + " money\", \"good value\", \"great price for the\nquality\"). Lower case, typos,"
            + " dropped apostrophes, some ALL CAPS words, the odd emoji, negations\n(\"I did NOT"
            + " know when it would arrive\", \"wasnt sure it would fit under my cabinets\"),"
            + " lists and\nline breaks. Answers with no planted theme are substantive but"
            + " off-catalogue and\nidiosyncratic, as in real surveys: "
            + MISC_STOPPED.size()
            + " and "
            + MISC_CHOSE.size()
            + " reasons of one buyer's own (\"the dog licks\neverything and I pictured the drip"
            + " tray\"), so each wording is rare and none recurs like a theme.\nIn wave 3 a few of those mention the now visible delivery date or"
            + " warranty (\"nothing, the\ndelivery date was right there at checkout\"): they"
            + " carry no planted theme, a trap for coding by\nkeyword alone.\n\n");
    s.append("| | Pilot | Wave 1 | Wave 2 | Wave 3 |\n|---|---|---|---|---|\n");
    s.append(
        statRow("non-answers (\"\", n/a, -, nothing, no, .)", waves, GeneratedAnswer::nonAnswer));
    s.append(
        statRow("not in English (de, fr, es, nl, it)", waves, a -> !a.language().equals("en")));
    s.append(
        statRow("with personal data (e-mail, phone, order, name)", waves, a -> !a.pii().isEmpty()));
    s.append(statRow("with a line break", waves, a -> a.text().indexOf('\n') >= 0));
    s.append(statRow("with a double quote", waves, a -> a.text().indexOf('"') >= 0));
    s.append(
        statRow(
            "with no planted theme (substantive)",
            waves,
            a -> !a.nonAnswer() && a.themes().isEmpty()));
    s.append("\nCounts are answers, out of two per respondent.\n\n");
    s.append("## Pilot coding\n\n");
    s.append(
        "`precoded-pilot.tsv` was coded by three coders (AK, JR, MT) who split the file in"
            + " blocks. Codes\nare the code names above separated by `; ` (JR's rows use `|`)."
            + " Non-answers are uncoded.\nAbout 5% of the planted labels were missed or coded as"
            + " a neighbouring theme, and a few extra\nlabels slipped in.\n\n");
    int planted = 0;
    int agreed = 0;
    for (GeneratedRespondent p : waves.get(PILOT).respondents()) {
      for (GeneratedAnswer a : List.of(p.stopped(), p.chose())) {
        planted += a.themes().size();
        agreed += (int) a.themes().stream().filter(a.coded()::contains).count();
      }
    }
    s.append("Planted labels: ").append(planted).append("; recorded by the coders: ");
    s.append(agreed).append(" (").append(percent(agreed / (double) planted)).append("%).\n\n");
    s.append("## Regenerating\n\n");
    s.append(
        "```\nmvn -q test-compile exec:java -Dexec.mainClass=riffle.tools.SampleResponses\n```\n\n");
    s.append(
        "(exec-maven-plugin runs with the test classpath but does not compile; drop"
            + " `test-compile` when\nthe test classes are fresh. An optional"
            + " `-Dexec.args=FOLDER` writes elsewhere.) The output is a pure function of the"
            + " seed\n(`DEMO_SEED`), so regenerating reproduces these files byte for byte;"
            + " `SampleResponsesTest`\nfails when they are stale. `SampleResponses.demoWaves()`"
            + " gives tests the same respondents with\ntheir planted themes, and"
            + " `SampleResponses.writeLargeExport(path, respondents, seed)` streams a\nlarge export"
            + " with the same columns for import benchmarks.\n");
    return s.toString();
  }

  /** Observed co-occurrence of two planted themes in one respondent over independence. */
  static double lift(List<GeneratedWave> waves, Theme a, Theme b) {
    int n = 0;
    int na = 0;
    int nb = 0;
    int both = 0;
    for (GeneratedWave w : waves) {
      for (GeneratedRespondent p : w.respondents()) {
        if (p.answer(a.question()).nonAnswer() || p.answer(b.question()).nonAnswer()) {
          continue;
        }
        boolean x = p.answer(a.question()).has(a);
        boolean y = p.answer(b.question()).has(b);
        n++;
        na += x ? 1 : 0;
        nb += y ? 1 : 0;
        both += x && y ? 1 : 0;
      }
    }
    return both * (double) n / ((double) na * nb);
  }

  private static String categories(Column c) {
    StringBuilder s = new StringBuilder();
    for (int i = 0; i < c.values().size(); i++) {
      if (i > 0) {
        s.append(", ");
      }
      s.append('`').append(c.values().get(i)).append("` (");
      s.append(Math.round(100 * c.weights().get(i))).append("%)");
    }
    return s.toString();
  }

  private static String statRow(
      String label, List<GeneratedWave> waves, Predicate<GeneratedAnswer> test) {
    StringBuilder s = new StringBuilder("| ").append(label);
    for (GeneratedWave w : waves) {
      long n =
          w.respondents().stream()
              .flatMap(p -> Stream.of(p.stopped(), p.chose()))
              .filter(test)
              .count();
      s.append(" | ").append(n);
    }
    return s.append(" |\n").toString();
  }

  private SampleResponses() {}
}
