package dev.tether.model;

/** Gives engines the model they score with; bound to engines as a uimaFIT external resource. */
public interface ModelHolder {
    TetherModel model();
}
