/**
 * Text analysis of answers with Apache OpenNLP: masking of personal data, language check,
 * sentences, tokens, Penn Treebank tags, chunks, stems and negation scope. The front door is {@link
 * riffle.text.TextAnalyzer}; {@link riffle.text.PiiMasker} masks on its own.
 */
package riffle.text;
