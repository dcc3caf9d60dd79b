/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Hazen–Williams: the C that gives a line's pipe-friction loss, for
 * engineers who think in C, and the loss a C gives. */
#pragma once

#include "regime.h"
#include "status.h"

/* The SI coefficient k of V = k·C·R^0.63·S^0.54 (V m/s, R m). */
#define RG_HAZEN_WILLIAMS_K_SI 0.849

/* The usual range of the formula, in which its C is a property of the
 * wall: fresh water, turbulent flow, a bore of at least this and a mean
 * velocity of at most this (common practice, no single source: the
 * formula was fitted to water mains of ordinary size, at ordinary
 * temperatures and velocities). */
#define RG_HAZEN_WILLIAMS_D_MIN_M 0.05
#define RG_HAZEN_WILLIAMS_V_MAX_M_S 3.0

/* Why a C lies outside the usual range (bits). */
typedef enum {
  RG_HW_NOTE_FLUID = 1 << 0,         /* not fresh water */
  RG_HW_NOTE_NOT_TURBULENT = 1 << 1, /* laminar or transitional */
  RG_HW_NOTE_VELOCITY = 1 << 2,      /* faster than V_MAX */
  RG_HW_NOTE_DIAMETER = 1 << 3,      /* narrower than D_MIN */
  RG_HW_N_NOTES = 4
} RgHazenWilliamsNote;

/* C from V = k·C·R^0.63·S^0.54, R = D/4 the hydraulic radius of a full
 * pipe and S = h_f/L the friction slope: the C with which the formula
 * gives the pipe-friction loss h_f over the length L at the mean velocity
 * V.  V, D, h_f and L must be positive and finite; the error's subjects are
 * the flow, the diameter, the head loss or the length. */
RgStatus rg_hazen_williams_c (double velocity_m_s, double diameter_m,
                              double head_loss_m, double length_m, double *c,
                              RgError *err);

/* The pipe-friction loss the formula gives for C, over L at V in a bore
 * D: h_f = L·(V/(k·C·R^0.63))^(1/0.54). */
RgStatus rg_hazen_williams_head_loss (double c, double velocity_m_s,
                                      double diameter_m, double length_m,
                                      double *head_loss_m, RgError *err);

/* The notes (RgHazenWilliamsNote bits) for a line of fresh water or not,
 * in a regime, at V in a bore D; 0 inside the usual range. */
unsigned rg_hazen_williams_notes (int fresh_water, RgRegime regime,
                                  double velocity_m_s, double diameter_m);

/* One note (a single bit): a fixed identifier for files ("other-fluid",
 * "not-turbulent", "velocity-high", "diameter-small"; "usual" for 0) and
 * a sentence for people, translated (rg_gettext). */
const char *rg_hazen_williams_note_id (unsigned note);
const char *rg_hazen_williams_note_text (unsigned note);
