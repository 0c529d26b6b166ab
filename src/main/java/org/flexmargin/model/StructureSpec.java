package org.flexmargin.model;

/**
 * Where the structural dynamics of a configuration come from: a user mode table, or a built-in
 * validation structure (uniform cantilever wing, typical section) that is turned into modes and
 * strips by the {@code structure} package.
 */
public sealed interface StructureSpec permits ModeTable, UniformCantileverWing, TypicalSection {}
