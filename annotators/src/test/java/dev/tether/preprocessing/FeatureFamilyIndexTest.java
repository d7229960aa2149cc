package dev.tether.preprocessing;

import opennlp.tools.postag.POSModel;
import opennlp.tools.postag.POSSample;
import opennlp.tools.postag.POSTagFormat;
import opennlp.tools.postag.POSTaggerFactory;
import opennlp.tools.postag.POSTaggerME;
import opennlp.tools.util.CollectionObjectStream;
import opennlp.tools.util.TrainingParameters;
import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Which taggers {@link FeatureFamilyIndex} serves: one trained with OpenNLP's default feature descriptor, and not one
 * with a descriptor of its own, which {@link MemoizedBeamTagger} then tags through OpenNLP's own context generator,
 * with {@link POSTaggerME}'s tags. The word-by-word and score-by-score checks on UD English EWT are in test-corpora
 * ({@code FeatureFamilyIndexEwtTest}, {@code MemoizedBeamTaggerEwtTest}).
 */
class FeatureFamilyIndexTest {
    /** Invented ferry-log sentences, tagged by hand with Penn Treebank tags. */
    private static final String[][] SENTENCES = {
            {"The_DT", "engineer_NN", "replaced_VBD", "the_DT", "gasket_NN", "on_IN", "the_DT", "pump_NN", "._."},
            {"The_DT", "mate_NN", "logged_VBD", "a_DT", "leak_NN", "in_IN", "the_DT", "ballast_NN", "tank_NN", "._."},
            {"Crew_NNS", "checked_VBD", "the_DT", "bearings_NNS", "and_CC", "seals_NNS", "after_IN", "the_DT", "crossing_NN", "._."},
    };

    private static POSModel train(byte[] descriptor) throws Exception {
        List<POSSample> samples = new ArrayList<>();
        for (int copy = 0; copy < 5; copy++) {
            for (String[] s : SENTENCES) samples.add(POSSample.parse(String.join(" ", s)));
        }
        TrainingParameters p = new TrainingParameters();
        p.put(TrainingParameters.ITERATIONS_PARAM, 10);
        p.put(TrainingParameters.CUTOFF_PARAM, 1);
        return POSTaggerME.train("en", new CollectionObjectStream<>(samples), p,
                new POSTaggerFactory(descriptor, Map.of(), null));
    }

    private static byte[] defaultDescriptor() throws Exception {
        return POSTaggerFactory.class.getResourceAsStream("/opennlp/tools/postag/pos-default-features.xml").readAllBytes();
    }

    private static void tagsAsOpenNlp(POSModel model) {
        MemoizedBeamTagger tagger = new MemoizedBeamTagger(model);
        POSTaggerME reference = new POSTaggerME(model, POSTagFormat.PENN);
        for (String[] s : SENTENCES) {
            String[] words = new String[s.length];
            for (int i = 0; i < s.length; i++) words[i] = s[i].substring(0, s[i].lastIndexOf('_'));
            assertArrayEquals(reference.tag(words), tagger.tag(words));
        }
    }

    @Test
    void aTaggerWithOpenNlpsDefaultFeaturesIsIndexedOncePerModel() throws Exception {
        POSModel model = train(defaultDescriptor());
        assertTrue(FeatureFamilyIndex.of(model).isPresent());
        assertSame(FeatureFamilyIndex.of(model).orElseThrow(), FeatureFamilyIndex.of(model).orElseThrow());
        tagsAsOpenNlp(model);
    }

    @Test
    void aTaggerWithItsOwnFeatureDescriptorIsTaggedThroughOpenNlpsGenerator() throws Exception {
        // The default set without the prefix features: other contexts, which the index must not pretend to build.
        String own = new String(defaultDescriptor(), StandardCharsets.UTF_8)
                .replace("<generator class=\"opennlp.tools.util.featuregen.PrefixFeatureGeneratorFactory\"/>", "");
        POSModel model = train(own.getBytes(StandardCharsets.UTF_8));
        assertEquals(false, FeatureFamilyIndex.of(model).isPresent());
        tagsAsOpenNlp(model);
    }

    @Test
    void lowerCasingIsOpenNlpsCodePointByCodePoint() {
        for (String w : List.of("Pump", "PUMP", "pump", "\u0130stanbul", "\u03A3\u039F\u03A3", "\uD801\uDC00x", "")) {
            assertEquals(opennlp.tools.util.StringUtil.toLowerCase(w), FeatureFamilyIndex.lowerCase(w), w);
        }
    }
}
