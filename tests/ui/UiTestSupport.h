#pragma once
// Shared helpers of the shell's UI tests: the demo project and a few lookups.

#include "airwright/core/chain/SectionResult.h"
#include "airwright/core/project/Project.h"
#include "airwright/core/project/ProjectFile.h"
#include "airwright/ui/ProjectDocument.h"

#include <QString>

#include <gtest/gtest.h>

#include <string>
#include <vector>

namespace Airwright::Ui::ShellTest {

inline QString demoPath()
{
    return QStringLiteral(AIRWRIGHT_SOURCE_DIR "/resources/demo/demo-library.awproj");
}

inline void openDemo(ProjectDocument& document)
{
    document.load(demoPath());
    ASSERT_TRUE(document.result().has_value()) << document.computeError().toStdString();
}

inline std::vector<std::string> ids(const std::vector<Core::Chain::Section>& path)
{
    std::vector<std::string> out;
    for (const auto& s : path)
        out.push_back(s.id);
    return out;
}

inline const Core::Chain::SectionResult* resultOf(const ProjectDocument& document, std::size_t caseIndex,
                                                  Core::Chain::PathKind path, const std::string& id)
{
    const auto& result = document.result();
    if (!result || caseIndex >= result->cases.size())
        return nullptr;
    return result->cases[caseIndex].find(path, id);
}

} // namespace Airwright::Ui::ShellTest
