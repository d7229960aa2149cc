package dev.tether.candidates;

import java.util.ArrayList;
import java.util.List;

import org.apache.uima.UIMAFramework;
import org.apache.uima.cas.CAS;
import org.apache.uima.cas.Feature;
import org.apache.uima.cas.Type;
import org.apache.uima.cas.text.AnnotationFS;
import org.apache.uima.fit.factory.JCasFactory;
import org.apache.uima.fit.factory.TypeSystemDescriptionFactory;
import org.apache.uima.jcas.JCas;
import org.apache.uima.resource.metadata.TypeSystemDescription;
import org.apache.uima.util.CasCreationUtils;
import org.apache.uima.util.XMLInputSource;

/**
 * Builds CASes typed with the test-only host type system {@code HarbourHostTypeSystem.xml} (segments, words, and a
 * separate word-category annotation holding the tag) merged with Tether's type system.
 */
final class HarbourHostCas {
    static final String SEGMENT = "org.example.harbour.Segment";
    static final String WORD = "org.example.harbour.Word";
    static final String WORD_CATEGORY = "org.example.harbour.WordCategory";
    static final String TAG_PATH = "posTag/value";

    final JCas jcas;
    final List<AnnotationFS> words = new ArrayList<>();

    private HarbourHostCas(JCas jcas) {
        this.jcas = jcas;
    }

    static TypeSystemDescription hostTypeSystem() throws Exception {
        return UIMAFramework.getXMLParser().parseTypeSystemDescription(new XMLInputSource(
                HarbourHostCas.class.getResource("HarbourHostTypeSystem.xml")));
    }

    /** Tether's types (found through the type-system SPI) plus the host's. */
    static JCas emptyCas() throws Exception {
        TypeSystemDescription merged = CasCreationUtils.mergeTypeSystems(List.of(
                TypeSystemDescriptionFactory.createTypeSystemDescription(), hostTypeSystem()));
        return JCasFactory.createJCas(merged);
    }

    /** One segment over the sentence; every word references a word category carrying its hand-assigned tag. */
    static HarbourHostCas of(HandTaggedText sentence) throws Exception {
        HarbourHostCas host = new HarbourHostCas(emptyCas());
        CAS cas = host.jcas.getCas();
        cas.setDocumentText(sentence.text);
        Type word = cas.getTypeSystem().getType(WORD);
        Type category = cas.getTypeSystem().getType(WORD_CATEGORY);
        Feature posTag = word.getFeatureByBaseName("posTag");
        Feature value = category.getFeatureByBaseName("value");
        for (int i = 0; i < sentence.size(); i++) {
            AnnotationFS tag = cas.createAnnotation(category, sentence.begin(i), sentence.end(i));
            tag.setStringValue(value, sentence.tags.get(i));
            cas.addFsToIndexes(tag);
            AnnotationFS w = cas.createAnnotation(word, sentence.begin(i), sentence.end(i));
            w.setFeatureValue(posTag, tag);
            cas.addFsToIndexes(w);
            host.words.add(w);
        }
        cas.addFsToIndexes(cas.createAnnotation(cas.getTypeSystem().getType(SEGMENT), 0, sentence.text.length()));
        return host;
    }
}
