#pragma once

#include "airwright/core/chain/AirHandlingUnit.h"
#include "airwright/ui/ValueCommand.h"

namespace Airwright::Ui {

// Replaces the site (altitude or measured barometric pressure).
class EditSiteCommand : public ValueCommand<Core::Chain::Site> {
public:
    EditSiteCommand(ProjectDocument* document, Core::Chain::Site newValue);

protected:
    void apply(const Core::Chain::Site& value) override;
};

} // namespace Airwright::Ui
