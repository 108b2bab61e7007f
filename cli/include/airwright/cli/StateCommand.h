#pragma once

#include "airwright/cli/Command.h"

namespace Airwright::Cli {

// "airwright-cli state": every property of one moist-air state from the dry bulb
// and exactly one of relative humidity, wet bulb, dew point or humidity ratio, at
// a pressure given directly or as an altitude in the standard atmosphere.
// Output is text (one property per line) or JSON with fixed keys (tdb_C, rh_pct,
// w_gkg, tdp_C, twb_C, h_kJkg, v_m3kg, rho_kgm3, pws_Pa, p_Pa) for scripts.
class StateCommand : public Command {
public:
    std::string name() const override;
    std::string summary() const override;
    std::string help() const override;
    int run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err) override;
};

} // namespace Airwright::Cli
