/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <adwaita.h>

G_BEGIN_DECLS

#define RUGOSA_TYPE_APPLICATION (rugosa_application_get_type ())
G_DECLARE_FINAL_TYPE (RugosaApplication, rugosa_application, RUGOSA, APPLICATION, AdwApplication)

RugosaApplication *rugosa_application_new          (void);
GSettings         *rugosa_application_get_settings (RugosaApplication *self);

G_END_DECLS
