/**
 * Shared reading of Faultbench extension points: every point's reader validates its contributions the same way and
 * reports a bad one with the contributing bundle's id instead of failing.
 */
package org.faultbench.core.extension;
