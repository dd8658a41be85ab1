/// @file pumploss.hpp
/// @brief Umbrella header: includes every public header of the pumploss C++ core.
#ifndef PUMPLOSS_PUMPLOSS_HPP
#define PUMPLOSS_PUMPLOSS_HPP

#include "version.hpp"
#include "status.hpp"
#include "scalar_traits.hpp"
#include "units.hpp"
#include "fluid.hpp"
#include "gap.hpp"
#include "orifice.hpp"
#include "friction.hpp"
#include "fittings.hpp"
#include "line.hpp"
#include "drain_check.hpp"
#include "dual.hpp"
#include "efficiency.hpp"
#include "leakage.hpp"
#include "thermal.hpp"
#include "loss_model.hpp"
#include "uncertainty.hpp"
#include "health.hpp"
#include "health_monitor.hpp"
#include "piston_pump.hpp"
#include "clearance_budget.hpp"
#include "gear_pump.hpp"
#include "vane_pump.hpp"
#include "flow_test.hpp"
#include "motor.hpp"
#include "inlet.hpp"

#endif
