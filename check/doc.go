// Package check defines the one currency every sagspan check returns: a
// Result comparing a demand with a capacity, its Status, and a Report that
// gathers results across load cases, finds the governing case of each check
// and renders them as aligned text, Markdown and JSON.
//
// Convention: ratio = demand / capacity, and a ratio of at most 1 passes.
// Stability checks with a required factor of safety put the factor on the
// demand side (demand = required factor × driving action, capacity =
// resisting action) and also report the factor provided, resisting/driving.
//
// Values are held in SI (see package units) with their units.Kind, and are
// formatted only when rendered.
//
// Every rendered report carries Caution: the results support, and never
// replace, the design of a qualified engineer.
package check
