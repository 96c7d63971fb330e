/**
 * The bench window's model: live sources (serial probe, simulated board, replayed capture file),
 * the pipeline that measures their edges on the source's own thread and hands immutable frames to
 * the window, and read-only JavaFX properties with command methods for every panel (source, design,
 * readings, suspects, trimmer guide, recording). Nothing here touches the scene graph, so the model
 * is tested without a window; {@link org.rcbench.gui.view} only binds to it. Depends on the core,
 * probe, serial, capture and record; nothing outside the GUI and the CLI depends on it.
 */
package org.rcbench.gui;
