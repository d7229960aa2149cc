package dev.tether.cli;

import dev.tether.attachment.ReviewedChoice;
import dev.tether.audit.ReviewSheetReader;
import dev.tether.candidates.HeadClass;
import dev.tether.model.ModelTrainer;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * {@code train --corrections}: the marked lines of a review sheet become weighted head-choice events — for each, the
 * preposition, every offered head word with its class, the object, and the reviewer's choice as the hit. Lines that
 * cannot be used are reported with their line number; the rest are counted.
 */
final class CorrectionEvents {
    /** How many training cases one reviewed decision counts as, unless {@code --correction-weight} says otherwise. */
    static final double DEFAULT_WEIGHT = 1.0;

    private CorrectionEvents() {
    }

    static double weight(String given, boolean corrections) throws UsageException {
        if (given == null) return DEFAULT_WEIGHT;
        if (!corrections) throw new UsageException("--correction-weight needs --corrections");
        try {
            double w = Double.parseDouble(given);
            if (w > 0 && !Double.isInfinite(w)) return w;
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new UsageException("--correction-weight takes a positive number, got '" + given + "'");
    }

    /** Counts the sheet's reviewed lines into {@code trainer}; returns how many lines could not be used. */
    static int add(ModelTrainer trainer, Path sheetFile, double weight, PrintStream out, PrintStream err) throws IOException {
        ReviewSheetReader.Sheet sheet = new ReviewSheetReader().read(sheetFile);
        List<ReviewedChoice> choices = new ArrayList<>();
        int accepted = 0;
        for (ReviewSheetReader.ReviewedLine r : sheet.reviewed()) {
            List<String> heads = new ArrayList<>();
            List<HeadClass> classes = new ArrayList<>();
            for (ReviewSheetReader.Offered o : r.offered()) {
                heads.add(o.head().text());
                classes.add(o.headClass());
            }
            choices.add(new ReviewedChoice(r.preposition().text(), r.object().text(), heads, classes, r.chosen(), weight));
            if (r.chosen() == 0) accepted++;
        }
        trainer.addReviewedChoices(choices, sheetFile.getFileName().toString(), TrainCommand.fileSha256(sheetFile));
        out.printf("%-40s %,9d reviewed decisions (%,d accepted, %,d corrected), weight %s; %,d not reviewed%s%n",
                sheetFile.getFileName(), choices.size(), accepted, choices.size() - accepted, weight, sheet.unreviewed(),
                sheet.problems().isEmpty() ? "" : String.format("; %,d lines skipped", sheet.problems().size()));
        for (String p : sheet.problems()) err.println(p);
        return sheet.problems().size();
    }
}
