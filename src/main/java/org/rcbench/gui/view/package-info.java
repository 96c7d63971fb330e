/**
 * The bench window's JavaFX views: they bind to {@link org.rcbench.gui.BenchModel}'s read-only
 * properties and forward user actions to its command methods, nothing more. Live plots are drawn
 * on {@link javafx.scene.canvas.Canvas} from the model's frames, decimated per pixel column; one
 * {@link javafx.animation.AnimationTimer} ({@link org.rcbench.gui.view.FrameLoop}) polls the model
 * once per frame. Also the launcher (plain class, not an {@code Application}) and the headless
 * snapshot used by {@code rcbench gui --snapshot}.
 */
package org.rcbench.gui.view;
