/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Hazen–Williams, the SI form as published:
 *
 *   V = 0.849·C·R^0.63·S^0.54
 *
 * V the mean velocity (m/s), R the hydraulic radius (m; D/4 for a full
 * round pipe), S the friction slope h_f/L.  Williams, G. S. and Hazen, A.
 * (1905), Hydraulic Tables, give V = 1.318·C·R^0.63·S^0.54 in feet and
 * seconds; 0.849 = 1.318·0.3048^0.37 is the SI coefficient, rounded to
 * three figures, as the handbooks print it (from memory of Williams and
 * Hazen and of the SI form in water-supply handbooks; not checked against
 * the document).  The form with Q, h_f = 10.67·L·Q^1.852/(C^1.852·D^4.87),
 * is the same formula with its exponents rounded; this file uses the
 * velocity form, so that a C computed here and put back into it gives the
 * loss it came from to rounding error.
 *
 * Method: both directions in closed form, C = V/(k·R^0.63·S^0.54) and
 * S = (V/(k·C·R^0.63))^(1/0.54); a few ulps each (pow).
 *
 * The formula is an empirical fit for water in turbulent flow; outside its
 * usual range (other fluids, laminar or transitional flow, small bores,
 * high velocities) its C still reproduces one loss but is no property of
 * the wall: rg_hazen_williams_notes says which limits a point passes. */
#include "hazen-williams.h"

#include "message-private.h"

#include <math.h>

/* The exponents of the published formula. */
static const double R_EXP = 0.63;
static const double S_EXP = 0.54;

static int
positive (double x)
{
  return isfinite (x) && x > 0.0;
}

static RgStatus
check_common (double velocity_m_s, double diameter_m, double length_m,
              RgError *err)
{
  char v[RG_VALUE_MAX];

  if (!positive (velocity_m_s))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (FLOW),
                            "The velocity for Hazen-Williams must be positive; it is %s.",
                            RG_ERR_VALUE (err, RG_QTY_VELOCITY, velocity_m_s, v));
  if (!positive (diameter_m))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (DIAMETER),
                            "The bore for Hazen-Williams must be positive; it is %s.",
                            RG_ERR_VALUE (err, RG_QTY_LENGTH, diameter_m, v));
  if (!positive (length_m))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (LENGTH),
                            "The length for Hazen-Williams must be positive; it is %s.",
                            RG_ERR_VALUE (err, RG_QTY_LENGTH, length_m, v));
  return RG_OK;
}

RgStatus
rg_hazen_williams_c (double velocity_m_s, double diameter_m,
                     double head_loss_m, double length_m, double *c,
                     RgError *err)
{
  RgStatus st = check_common (velocity_m_s, diameter_m, length_m, err);
  double result;
  char v[RG_VALUE_MAX];

  if (st != RG_OK)
    return st;
  if (!positive (head_loss_m))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (HEAD_LOSS),
                            "The pipe-friction loss for Hazen-Williams must be positive; it is %s.",
                            RG_ERR_VALUE (err, RG_QTY_LENGTH, head_loss_m, v));
  result = velocity_m_s / (RG_HAZEN_WILLIAMS_K_SI * pow (diameter_m / 4.0, R_EXP)
                           * pow (head_loss_m / length_m, S_EXP));
  if (!positive (result))
    return rg_error_set_on (err, RG_ERR_NUMERIC, RG_ON (HEAD_LOSS),
                            "No Hazen-Williams C gives a pipe-friction loss of %s.",
                            RG_ERR_VALUE (err, RG_QTY_LENGTH, head_loss_m, v));
  *c = result;
  return RG_OK;
}

RgStatus
rg_hazen_williams_head_loss (double c, double velocity_m_s, double diameter_m,
                             double length_m, double *head_loss_m,
                             RgError *err)
{
  RgStatus st = check_common (velocity_m_s, diameter_m, length_m, err);
  double s;

  if (st != RG_OK)
    return st;
  if (!positive (c))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (VALUE),
                            "A Hazen-Williams C must be positive; it is %g.", c);
  s = pow (velocity_m_s / (RG_HAZEN_WILLIAMS_K_SI * c * pow (diameter_m / 4.0, R_EXP)),
           1.0 / S_EXP);
  if (!(isfinite (s) && s * length_m > 0.0 && isfinite (s * length_m)))
    return rg_error_set_on (err, RG_ERR_NUMERIC, RG_ON (VALUE),
                            "The Hazen-Williams C %g gives no finite loss for this line.", c);
  *head_loss_m = s * length_m;
  return RG_OK;
}

unsigned
rg_hazen_williams_notes (int fresh_water, RgRegime regime,
                         double velocity_m_s, double diameter_m)
{
  unsigned notes = 0;

  if (!fresh_water)
    notes |= RG_HW_NOTE_FLUID;
  if (regime != RG_REGIME_TURBULENT)
    notes |= RG_HW_NOTE_NOT_TURBULENT;
  if (velocity_m_s > RG_HAZEN_WILLIAMS_V_MAX_M_S)
    notes |= RG_HW_NOTE_VELOCITY;
  if (diameter_m < RG_HAZEN_WILLIAMS_D_MIN_M)
    notes |= RG_HW_NOTE_DIAMETER;
  return notes;
}

const char *
rg_hazen_williams_note_id (unsigned note)
{
  switch (note)
    {
    case 0:
      return "usual";
    case RG_HW_NOTE_FLUID:
      return "other-fluid";
    case RG_HW_NOTE_NOT_TURBULENT:
      return "not-turbulent";
    case RG_HW_NOTE_VELOCITY:
      return "velocity-high";
    case RG_HW_NOTE_DIAMETER:
      return "diameter-small";
    default:
      return "";
    }
}

const char *
rg_hazen_williams_note_text (unsigned note)
{
  switch (note)
    {
    case RG_HW_NOTE_FLUID:
      return rg_gettext ("Hazen-Williams was fitted to fresh water: for another fluid its C is no property of the wall.");
    case RG_HW_NOTE_NOT_TURBULENT:
      return rg_gettext ("Hazen-Williams holds for turbulent flow only: in laminar or transitional flow its C changes with the flow.");
    case RG_HW_NOTE_VELOCITY:
      return rg_gettext ("Hazen-Williams is used for velocities up to about 3 m/s: above, its C changes with the flow.");
    case RG_HW_NOTE_DIAMETER:
      return rg_gettext ("Hazen-Williams is used for bores from about 50 mm: in a smaller bore its C changes with the size.");
    default:
      return "";
    }
}
