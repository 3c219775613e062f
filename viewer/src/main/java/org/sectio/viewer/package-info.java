/**
 * The desktop viewer of computed modes. A placeholder until the viewer is built: it holds no code yet
 * and must never hold solver logic (see DEVELOPERS.md).
 */
package org.sectio.viewer;
