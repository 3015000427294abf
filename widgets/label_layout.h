#pragma once
// Keeps the labels of a diagram off one another. After each layout of the plot (the
// afterLayout signal, so with the pixel geometry it is drawn with), every horizontal text is
// checked, in the order it was added, against the texts before it: one that overlaps them
// takes the first other placement around its anchor (below or above it, right or left of it)
// that overlaps none and stays inside the axes, or keeps its place. Region labels and the
// labels drawn first keep theirs; a pan or zoom starts again from the placements as rendered.
class QCustomPlot;

namespace pw::ui {

// Connects `plot` to separateLabels() once (renderScene calls it on every render).
void keepLabelsApart(QCustomPlot &plot);
// One pass over the plot's texts, with its current layout.
void separateLabels(QCustomPlot &plot);

}  // namespace pw::ui
