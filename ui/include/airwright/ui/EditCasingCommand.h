#pragma once

#include "airwright/core/chain/AirHandlingUnit.h"
#include "airwright/ui/ValueCommand.h"

namespace Airwright::Ui {

// Replaces the casing sizing inputs (face velocity, fixed width or height, grid).
class EditCasingCommand : public ValueCommand<Core::Chain::Casing> {
public:
    EditCasingCommand(ProjectDocument* document, Core::Chain::Casing newValue);

protected:
    void apply(const Core::Chain::Casing& value) override;
};

} // namespace Airwright::Ui
