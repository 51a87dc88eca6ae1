// Package check defines the one currency every sagspan check returns: a
// Result comparing a demand with a capacity, its Status, and a Report that
// gathers results across load cases, finds the governing case of each check
// and renders them as aligned text, Markdown and JSON.
//
// Convention: ratio = demand / capacity, and a ratio of at most 1 passes.
// Stability checks speak in their own terms: demand is the driving action,
// capacity the resisting action, and the factor of safety provided
// (resisting/driving) is set against the one required, ratio =
// required/provided. A result that only reports a value (Record) has no
// capacity and no ratio.
//
// Every result carries its named intermediate quantities as Values
// (symbol, meaning, SI value, kind), so that a program can tabulate the
// terms of any check by name without knowing the check and without
// parsing its notes. Notes are kept for what is not a number.
//
// Values are held in SI (see package units) with their units.Kind, and are
// formatted only when rendered.
//
// Every rendered report carries Caution: the results support, and never
// replace, the design of a qualified engineer.
//
// # References
//
// This package defines the currency of the checks and cites no published
// method of its own; each check's Basis names its method and source, and
// the packages that make the checks list those sources in their own
// References sections.
package check
