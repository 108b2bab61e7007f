#pragma once

#include "airwright/core/chain/AirHandlingUnit.h"
#include "airwright/ui/ValueCommand.h"

namespace Airwright::Ui {

// Replaces the design airflows, their basis and the external pressures.
class EditAirflowsCommand : public ValueCommand<Core::Chain::Airflows> {
public:
    EditAirflowsCommand(ProjectDocument* document, Core::Chain::Airflows newValue);

protected:
    void apply(const Core::Chain::Airflows& value) override;
};

} // namespace Airwright::Ui
