#pragma once

#include "airwright/core/chain/DesignCase.h"
#include "airwright/ui/ValueCommand.h"

#include <vector>

namespace Airwright::Ui {

// Replaces the list of design cases (add, rename, remove or edit a field).
class EditCasesCommand : public ValueCommand<std::vector<Core::Chain::DesignCase>> {
public:
    EditCasesCommand(ProjectDocument* document, std::vector<Core::Chain::DesignCase> newValue);

protected:
    void apply(const std::vector<Core::Chain::DesignCase>& value) override;
};

} // namespace Airwright::Ui
